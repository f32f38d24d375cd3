// GET /api/v1/portfolio.xlsx – the portfolio's approved figures as a workbook, with the cautions
import { VALUATION_CAUTION } from '@/lib/caution';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { listProjects } from '@/lib/projects/service';
import { portfolioWorkbook } from '@/lib/spreadsheets/portfolio-export';
import { xlsxResponse } from '@/lib/spreadsheets/xlsx-response';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const GET = withAuth(
  async ({ member }) => xlsxResponse(await portfolioWorkbook(await listProjects(member), member.orgName, VALUATION_CAUTION), 'Leeway portfolio.xlsx'),
  operations.portfolioXlsx,
);
