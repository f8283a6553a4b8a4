import { NextResponse } from 'next/server';
import { ownRowId } from '@/lib/data/access';
import { requireUser } from '@/lib/auth/session';
import { requestReportSend } from '@/lib/data/report-sends';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { notFound } from '@/lib/server/errors';
import { bodyOf, handle, idOf, parseOrThrow } from '@/lib/server/http';
import { getReportData } from '@/lib/data/report';
import { renderReportPdf, reportFileName } from '@/lib/report/pdf';
import { sendReportSchema } from '@/lib/validation/report';

/** Queues the repair report e-mail: 202 with the send-log row; the worker does the sending. */
export const POST = handle(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser(DESK_ROLES);
  const id = await ownRowId(user, 'job', params, 'Job');
  const input = parseOrThrow(sendReportSchema, await bodyOf(request));
  return NextResponse.json(await requestReportSend(user, id, input), { status: 202 });
});

/** The office's preview of the report PDF, whatever the job's status. */
export const GET = handle(async (_request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser(DESK_ROLES);
  const id = await idOf(params, 'Job');
  const data = await getReportData(user, id);
  if (!data) throw notFound('Job');
  const pdf = await renderReportPdf(data);
  return new Response(new Uint8Array(pdf), {
    headers: {
      'content-type': 'application/pdf',
      'content-disposition': `inline; filename="${reportFileName(data.job.number)}"`,
      'cache-control': 'private, no-store',
    },
  });
});
