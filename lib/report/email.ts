import { translatorFor } from '@/i18n/translator';
import { formatDay } from '@/lib/time/dates-locale';
import type { ReportData } from '@/lib/data/report';

// The e-mail that carries the report: plain, inline-styled HTML (mail clients drop <style>) and a
// text part saying the same, in the customer's language. The PDF is attached by the sender; the link opens the web copy.

export type ReportEmail = { subject: string; html: string; text: string };

export function reportEmail(
  data: ReportData,
  options: { link: string; expiresOn: string; message?: string | null },
): ReportEmail {
  const { company, job, site } = data;
  const t = translatorFor(data.locale, 'report');
  const subject = t('subject', { address: site.address, number: job.number });
  const count = data.repairs.length === 1 ? t('oneRepair') : t('repairs', { count: data.repairs.length });
  const lines = data.repairs.map((r) => {
    const where = t('emailRepair', {
      position: r.position,
      defect: r.defect.toLowerCase(),
      distance: r.distance,
      accessPoint: r.accessPoint,
    });
    const patch = r.patchLength ? t('emailPatch', { length: r.patchLength }) : '';
    const result = r.install?.inspection?.result === 'pass' ? t('passedLower') : t('notPassedLower');
    return `${where}${patch}${r.install?.inspection ? t('emailInspection', { result }) : ''}`;
  });
  const greeting = t('greeting', { name: data.customer.contactName ?? data.customer.name });
  const intro = t('intro', { company: company.name, address: site.address, count });
  const linkLine = t('linkLine', { date: formatDay(options.expiresOn, data.locale) });
  const closing = t('closing', { company: company.name });

  const text = [
    greeting,
    '',
    intro,
    '',
    ...(options.message ? [options.message, ''] : []),
    ...lines,
    '',
    linkLine,
    options.link,
    '',
    data.deferral,
    '',
    closing,
  ].join('\n');

  const BODY_STYLE =
    'margin:0;padding:24px;background:#f8fafc;font-family:Arial,Helvetica,sans-serif;font-size:15px;line-height:1.5;color:#0f172a';
  const p = (content: string, style = '') => `<p style="margin:0 0 12px;${style}">${content}</p>`;
  const html = `<!doctype html><html><body style="${BODY_STYLE}">
<div style="max-width:560px;margin:0 auto;background:#ffffff;border:1px solid #e2e8f0;border-radius:6px;padding:24px">
${p(escapeHtml(company.name), 'font-weight:bold;color:#115e59')}
${p(escapeHtml(greeting))}
${p(escapeHtml(intro))}
${options.message ? p(escapeHtml(options.message).replace(/\n/g, '<br>'), 'padding:8px 12px;border-left:3px solid #115e59;background:#f1f5f9') : ''}
<ul style="margin:0 0 12px;padding-left:20px">${lines.map((line) => `<li>${escapeHtml(line)}</li>`).join('')}</ul>
${p(escapeHtml(linkLine))}
${p(
  `<a href="${escapeHtml(options.link)}" style="display:inline-block;background:#115e59;color:#ffffff;text-decoration:none;padding:10px ` +
    `16px;border-radius:4px">${escapeHtml(t('open'))}</a>`,
)}
${p(escapeHtml(data.deferral), 'font-size:13px;color:#475569')}
${p(escapeHtml(closing), 'font-size:13px;color:#475569')}
</div></body></html>`;
  return { subject, html, text };
}

const escapeHtml = (value: string) => value.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
