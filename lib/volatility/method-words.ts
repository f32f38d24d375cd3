/** How a case's volatility was obtained, as a label (the case's settings, the validation report). */
export const volatilityMethodLabels = { direct: 'Entered directly', history: 'Estimated from history', 'monte-carlo': 'Estimated by Monte Carlo' } as const;
