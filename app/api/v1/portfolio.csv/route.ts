// GET /api/v1/portfolio.csv – one row per project with its approved version's figures
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { listProjects } from '@/lib/projects/service';
import { portfolioCsv } from '@/lib/spreadsheets/portfolio-export';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const GET = withAuth(
  async ({ member }) =>
    new Response(portfolioCsv(await listProjects(member)), {
      headers: {
        'content-type': 'text/csv; charset=utf-8',
        'content-disposition': 'attachment; filename="Leeway portfolio.csv"',
        'cache-control': 'no-store',
      },
    }),
  operations.portfolioCsv,
);
