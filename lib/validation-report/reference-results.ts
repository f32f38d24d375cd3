/**
 * The engine's published-value checks as the validation report shows them: produced at build
 * time by scripts/reference-results.ts from the test tables (tests/lattice/reference/
 * published-checks.ts) into .data/reference-results.json, never typed by hand.
 */
import { readFile } from 'node:fs/promises';
import path from 'node:path';

export interface ReferenceResult {
  source: string;
  what: string;
  published: number;
  engine: number;
  tolerance: number;
  passes: boolean;
}

export interface ReferenceResults {
  engineVersion: string;
  generatedAt: string;
  checks: ReferenceResult[];
}

export const REFERENCE_RESULTS_FILE = 'reference-results.json';

/** The build's results, or null when this build has none (the report says so). */
export async function readReferenceResults(): Promise<ReferenceResults | null> {
  try {
    return JSON.parse(await readFile(path.join(/*turbopackIgnore: true*/ process.cwd(), '.data', REFERENCE_RESULTS_FILE), 'utf8')) as ReferenceResults;
  } catch {
    return null;
  }
}
