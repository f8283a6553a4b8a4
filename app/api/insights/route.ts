import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { getInsights } from '@/lib/data/insights';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { handle, parseOrThrow, searchParamsOf } from '@/lib/server/http';
import { insightsCsv } from '@/lib/insights/csv';
import { csvResponse } from '@/lib/server/csv';
import { insightsQuerySchema } from '@/lib/validation/insights';

/**
 * `?from=YYYY-MM-DD&to=YYYY-MM-DD&crewId=` (company-zone days, both included; at most two years) → the period's
 * figures (`Insights`, lib/data/insights.ts); `&format=csv` downloads the weekly table. Office and admin only;
 * a crew of another company is a 404.
 */
export const GET = handle(async (request: Request) => {
  const user = await requireUser(DESK_ROLES);
  const query = parseOrThrow(insightsQuerySchema, searchParamsOf(request));
  const insights = await getInsights(user, query);
  if (query.format !== 'csv') return NextResponse.json(insights);
  return csvResponse(`insights-${insights.period.from}-to-${insights.period.to}`, insightsCsv(insights));
});
