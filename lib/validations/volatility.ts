/** What the volatility routes read: a Monte Carlo estimate to start, or a history sent as JSON. */
import { z } from 'zod';
import { historySeriesSchema } from '../volatility/history';
import { simulationSpecSchema } from '../volatility/monte-carlo';

export const simulationStartSchema = z.object({ caseId: z.string().min(1).max(64), spec: simulationSpecSchema });

export const historyJsonSchema = z.object({ series: historySeriesSchema });
