import { randomUUID } from 'node:crypto';
import { simpleParser } from 'mailparser';
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as sendRoute } from '@/app/api/jobs/[id]/report/route';
import { GET as pdfRoute } from '@/app/r/[token]/pdf/route';
import { PATCH as customerPatchRoute } from '@/app/api/customers/[id]/route';
import { ReportView } from '@/components/report/report-view';
import { ReportSend } from '@/models';
import { stopBoss } from '@/lib/queue/boss';
import { startReportWorker } from '@/lib/queue/worker';
import { openReportLink } from '@/lib/report/link-access';
import { call, jsonBody } from './helpers/call';
import { signInAs } from './helpers/session';
import { eventually, makeApprovedJob, pdfText } from './report-fixtures';

// A customer whose language is Spanish gets the repair report in Spanish — the e-mail through the SMTP fake, its
// PDF, the /r page and the PDF behind the link — with Spanish numbers (decimal comma); the words come from
// messages/es.json. The English report is checked in report.test.ts.

const MAIL = process.env.MAIL_WEB_URL;

let worker: { stop: () => Promise<void> };
beforeAll(async () => {
  if (!MAIL || !process.env.SMTP_PORT)
    throw new Error('Start the service fakes first (scripts/test.sh does; see scripts/fakes.sh)');
  worker = await startReportWorker({ pollingIntervalSeconds: 0.5 });
});
afterAll(async () => {
  await worker?.stop();
  await stopBoss();
});

describe('the repair report in the customer’s language', () => {
  it('mails, renders and serves the report in Spanish for a customer whose language is es', async () => {
    const to = `cliente-${randomUUID().slice(0, 8)}@example.test`;
    const w = await makeApprovedJob(to);
    await signInAs(w.office);
    const patched = await call(
      customerPatchRoute,
      `/api/customers/${w.customer.id}`,
      { id: w.customer.id },
      jsonBody('PATCH', { language: 'es' }),
    );
    expect(patched.status).toBe(200);
    expect(patched.body.language).toBe('es');

    const { status, body } = await call(
      sendRoute,
      `/api/jobs/${w.job.id}/report`,
      { id: w.job.id },
      jsonBody('POST', {}),
    );
    expect(status).toBe(202);
    await eventually(
      async () => ((await ReportSend.findByPk(body.id))?.status === 'sent' ? true : undefined),
      20_000,
      'the send to go out',
    );

    const listed = await eventually(
      async () => {
        const messages = (await (await fetch(`${MAIL}/messages`)).json()) as { id: string; to: string }[];
        return messages.find((m) => m.to.includes(to));
      },
      10_000,
      'the message in the mailbox',
    );
    const mail = await simpleParser(
      Buffer.from(await (await fetch(`${MAIL}/messages/${listed.id}.eml`)).arrayBuffer()),
    );
    expect(mail.subject).toBe(`Informe de reparación de 1 Test Street, Testville (trabajo ${w.job.number})`);
    expect(mail.text).toContain('El informe completo va adjunto en PDF.');
    expect(mail.text).toContain('También puede leerlo en línea hasta el');
    expect(mail.text).toMatch(/Reparación 1: .* a .* de /);
    expect(mail.text).toContain('(inspección: superada)');
    expect(mail.text).toContain('profesional con licencia');
    expect(mail.text).not.toContain('Hello');
    expect(mail.html).toContain('Abrir el informe de reparación');

    const pdf = await pdfText(mail.attachments.find((a) => a.contentType === 'application/pdf')!.content);
    expect(pdf).toContain(`Informe de reparación · Trabajo ${w.job.number}`);
    expect(pdf).toContain('35,8 in'); // the 910 mm patch in the company's imperial units (910 / 25.4 = 35.83), decimal comma
    expect(pdf).toContain('Espacio confinado');
    expect(pdf).toContain('Empacador a presión');
    expect(pdf).toContain('Resina mezclada');
    expect(pdf).not.toContain('Confined space');

    // The customer's link: the page and its PDF speak the customer's language too.
    const token = /\/r\/([\w-]+\.[\w-]+)/.exec(mail.text ?? '')?.[1] ?? '';
    const access = await openReportLink(token);
    expect(access.ok).toBe(true);
    if (!access.ok) return;
    expect(access.data.locale).toBe('es');
    const html = renderToStaticMarkup(createElement(ReportView, { data: access.data, pdfHref: '/r/x/pdf' }));
    expect(html).toContain('lang="es"');
    expect(html).toContain(`Informe de reparación · Trabajo ${w.job.number}`);
    expect(html).toContain('Descargar PDF');
    expect(html).toContain('Precauciones');
    expect(html).toContain('Largo del parche');
    expect(html).toContain('35,8 in');
    expect(html).not.toContain('Patch length');

    const linked = await pdfRoute(new Request(`http://127.0.0.1/r/${token}/pdf`), {
      params: Promise.resolve({ token }),
    });
    expect(linked.status).toBe(200);
    expect(await pdfText(Buffer.from(await linked.arrayBuffer()))).toContain('Curado completo');
    // A worker send, two PDF renders and their text extraction: room for a busy machine.
  }, 120_000);

  it('refuses a language it does not have, and changes nothing', async () => {
    const w = await makeApprovedJob(null);
    await signInAs(w.office);
    const { status, body } = await call(
      customerPatchRoute,
      `/api/customers/${w.customer.id}`,
      { id: w.customer.id },
      jsonBody('PATCH', { language: 'fr' }),
    );
    expect(status).toBe(400);
    expect(body.error.fields.language).toBeTruthy();
    await w.customer.reload();
    expect(w.customer.language).toBe('en');
  });
});
