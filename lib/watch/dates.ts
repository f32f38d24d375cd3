/**
 * Calendar dates (YYYY-MM-DD, UTC) and the lattice's unit, years after a valuation date, at
 * 365.25 days a year: the one conversion the watch API, its form and its chart share.
 */
const DAY_MS = 86_400_000;
const YEAR_DAYS = 365.25;

export const dateOf = (d: Date): string => d.toISOString().slice(0, 10);

export const daysBetween = (from: string, to: string): number => (Date.parse(`${to}T00:00:00Z`) - Date.parse(`${from}T00:00:00Z`)) / DAY_MS;

export const yearsBetween = (from: string, to: string): number => daysBetween(from, to) / YEAR_DAYS;

export const dateAfter = (from: string, years: number): string => dateOf(new Date(Date.parse(`${from}T00:00:00Z`) + Math.round(years * YEAR_DAYS) * DAY_MS));
