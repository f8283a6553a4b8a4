import 'server-only';
import { companyNameOf, getReportDataForLink } from './data';
import { verifyReportLink } from './link';

// What a customer link opens. Every refusal looks the same from outside: no word on whether the job
// exists, was deleted, or belongs to someone else. A genuine but expired link may name its company.

export type LinkAccess =
  | { ok: true; data: NonNullable<Awaited<ReturnType<typeof getReportDataForLink>>>; claims: { jobId: string; companyId: string } }
  | { ok: false; status: 404 | 410; companyName: string | null };

export async function openReportLink(token: string, options: { images?: boolean } = {}): Promise<LinkAccess> {
  const check = verifyReportLink(token);
  if (!check.ok) {
    if (check.reason === 'expired') return { ok: false, status: 410, companyName: await companyNameOf(check.companyId) };
    return { ok: false, status: 404, companyName: null };
  }
  const data = await getReportDataForLink(check, options);
  if (!data) return { ok: false, status: 404, companyName: null };
  return { ok: true, data, claims: { jobId: check.jobId, companyId: check.companyId } };
}

/** The sentence shown for every refused link. */
export const refusedLinkText = (companyName: string | null) =>
  `This link is not valid or has expired — ask ${companyName ?? 'the company that sent it'} for a new one.`;
