import 'server-only';
import { isLinkLive } from '@/lib/data/report-links';
import { companyNameOf, getReportDataForLink } from '@/lib/data/report';
import { localeFromAcceptLanguage } from '@/i18n/locales';
import { translatorFor } from '@/i18n/translator';
import { verifyReportLink, type LinkCheck } from './link';

// What a customer link opens. Every refusal looks the same from outside: no word on whether the job
// exists, was deleted, belongs to someone else or had its links revoked. A genuine, unrevoked but
// expired link may name its company.

export type LinkAccess =
  | {
      ok: true;
      data: NonNullable<Awaited<ReturnType<typeof getReportDataForLink>>>;
      claims: { linkId: string; jobId: string; companyId: string };
    }
  | { ok: false; status: 404 | 410; companyName: string | null };

const REFUSED = { ok: false, status: 404, companyName: null } as const;

export async function openReportLink(token: string, options: { images?: boolean } = {}): Promise<LinkAccess> {
  const check = await checkLiveLink(token);
  if (!check.ok) {
    if (check.reason === 'expired')
      return { ok: false, status: 410, companyName: await companyNameOf(check.companyId) };
    return REFUSED;
  }
  const data = await getReportDataForLink(check, options);
  if (!data) return REFUSED;
  return { ok: true, data, claims: { linkId: check.linkId, jobId: check.jobId, companyId: check.companyId } };
}

/** The signature, expiry and link row of a token: a revoked or unknown link reads as a bad signature. */
export async function checkLiveLink(token: string, now = new Date()): Promise<LinkCheck> {
  const check = verifyReportLink(token, now);
  if (check.ok || check.reason === 'expired') {
    if (!(await isLinkLive(check))) return { ok: false, reason: 'signature' };
  }
  return check;
}

/** The company a refusal page may name: only for a genuine, unrevoked link. */
export async function refusalCompanyName(token: string): Promise<string | null> {
  const check = await checkLiveLink(token);
  return check.ok || check.reason === 'expired' ? companyNameOf(check.companyId) : null;
}

/** The sentence shown for every refused link, in the language of the browser's Accept-Language (English without). */
export function refusedLinkText(companyName: string | null, acceptLanguage?: string | null): string {
  const t = translatorFor(localeFromAcceptLanguage(acceptLanguage), 'report');
  return t('refused.text', { company: companyName ?? t('refused.theCompany') });
}
