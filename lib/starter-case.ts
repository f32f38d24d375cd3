/**
 * A new case's starting point: five years (0 to 5) of empty cash flows at the organisation's
 * WACC, its risk-free rate, a volatility to be replaced, and no options yet.
 */
import type { CaseInput } from './validations/case';

export function starterCase(name: string, defaults: { wacc: number; riskFreeRate: number }): CaseInput {
  return {
    name,
    cashFlows: {
      wacc: defaults.wacc,
      timing: 'end-of-year',
      rows: Array.from({ length: 6 }, (_, year) => ({ year, revenue: 0, operatingCost: 0, capex: 0, tax: 0, workingCapital: 0 })),
    },
    settings: { volatility: 0.3, riskFreeRate: defaults.riskFreeRate, steps: 100, tree: 'crr' },
    options: [],
  };
}
