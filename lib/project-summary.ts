/** The shape of `GET /api/v1/projects` rows as the browser receives them (dates as ISO text). */
export interface ProjectSummaryJson {
  id: string;
  name: string;
  description: string;
  currency: string;
  status: 'active' | 'archived';
  ownerName: string | null;
  caseCount: number;
  updatedAt: string;
  latest: {
    runId: string;
    caseId: string;
    caseName: string;
    staticNpv: number;
    optionPremium: number;
    expandedNpv: number;
    valuedAt: string;
  } | null;
}
