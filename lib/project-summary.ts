/** The rows of `GET /api/v1/projects` as the browser receives them (dates as ISO text). */
import type { ProjectSummary } from '@/db/queries/summaries';
import type { Jsonified } from './jsonified';

export type ProjectSummaryJson = Jsonified<ProjectSummary>;
