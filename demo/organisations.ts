/**
 * The demo's people and organisations. Everything here is invented: "Kestrel Bay Materials" and
 * "Harrow Fen Logistics" are not real companies, and the figures seeded with them are made up.
 * The password is for local demos only.
 */
import type { RoleName } from '@/lib/permissions';

export const DEMO_PASSWORD = 'leeway-demo-2026';

export interface DemoOrganisation {
  name: string;
  slug: string;
  settings: { currency: string; riskFreeRate: number; wacc: number; fiscalYearStartMonth: number };
  users: { email: string; name: string; role: RoleName }[];
  /** The member who builds and values the invented portfolio (demo/portfolio.ts), if the organisation has one. */
  portfolioBy?: string;
  /** The reviewer who decides the portfolio's seeded reviews. */
  reviewedBy?: string;
}

export const demoOrganisations: DemoOrganisation[] = [
  {
    name: 'Kestrel Bay Materials',
    slug: 'kestrel-bay-materials',
    settings: { currency: 'EUR', riskFreeRate: 0.03, wacc: 0.085, fiscalYearStartMonth: 1 },
    users: [
      { email: 'admin@kestrelbay.example', name: 'Morgan Ashby', role: 'admin' },
      { email: 'analyst@kestrelbay.example', name: 'Priya Lindqvist', role: 'analyst' },
      { email: 'reviewer@kestrelbay.example', name: 'Tomasz Okafor', role: 'reviewer' },
      { email: 'executive@kestrelbay.example', name: 'Helen Marsh', role: 'viewer' },
    ],
    portfolioBy: 'analyst@kestrelbay.example',
    reviewedBy: 'reviewer@kestrelbay.example',
  },
  {
    name: 'Harrow Fen Logistics',
    slug: 'harrow-fen-logistics',
    settings: { currency: 'GBP', riskFreeRate: 0.035, wacc: 0.09, fiscalYearStartMonth: 4 },
    users: [{ email: 'owner@harrowfen.example', name: 'Jamie Thorne', role: 'admin' }],
  },
];
