import { describe, expect, it } from 'vitest';
import { GET as pdfRoute } from '@/app/r/[token]/pdf/route';
import { Job } from '@/models';
import { openReportLink } from '@/lib/report/link-access';
import { makeWorld } from './helpers/world';
import { linkToken, makeApprovedJob, pdfText, unrecordedToken } from './report-fixtures';

const pdf = (token: string) =>
  pdfRoute(new Request(`http://localhost/r/${token}/pdf`), { params: Promise.resolve({ token }) });
const tokenFor = linkToken;

describe('the customer link /r/<token>', () => {
  it('opens the report of that one job, without internal notes or crew names', async () => {
    const w = await makeApprovedJob('c@example.test');
    await w.job.update({ notes: 'Gate code 9931 — internal' });
    const access = await openReportLink(await tokenFor(w.job.id, w.company.id));
    if (!access.ok) throw new Error(`refused: ${access.status}`);
    expect(access.data.job.number).toBe(w.job.number);
    expect(access.data.repairs).toHaveLength(1);
    expect(access.data.repairs[0].install?.kitLot).toBe(w.resinKit.lot);
    const everything = JSON.stringify(access.data);
    expect(everything).not.toContain('Gate code 9931');
    expect(everything).not.toContain(w.foreman.name);
    expect(everything).not.toContain(w.crew.name);

    const response = await pdf(await tokenFor(w.job.id, w.company.id));
    expect(response.status).toBe(200);
    expect(response.headers.get('content-disposition')).toContain(`repair-report-${w.job.number}.pdf`);
    expect(await pdfText(Buffer.from(await response.arrayBuffer()))).toContain(w.job.number);
  });

  it('refuses a tampered signature, a token moved to another job and an expired one, saying nothing about the job', async () => {
    const w = await makeApprovedJob('c@example.test');
    const other = await makeApprovedJob('d@example.test');
    const good = await tokenFor(w.job.id, w.company.id);
    const [payload, signature] = good.split('.');
    const flipped = `${payload}.${signature.slice(0, -2)}${signature.endsWith('AA') ? 'BB' : 'AA'}`;
    // The payload of another job with this job's signature.
    const moved = `${(await tokenFor(other.job.id, w.company.id)).split('.')[0]}.${signature}`;
    const expired = await tokenFor(w.job.id, w.company.id, new Date(Date.now() - 1000));

    for (const token of [flipped, moved, 'garbage', `${payload}.`, '']) {
      expect(await openReportLink(token)).toEqual({ ok: false, status: 404, companyName: null });
      const response = await pdf(token);
      expect(response.status).toBe(404);
      const text = await response.text();
      expect(text).toBe('This link is not valid or has expired — ask the company that sent it for a new one.');
    }
    // Genuine but expired: 410 naming the company, still nothing about the job.
    expect(await openReportLink(expired)).toEqual({ ok: false, status: 410, companyName: w.company.name });
    const gone = await pdf(expired);
    expect(gone.status).toBe(410);
    expect(await gone.text()).toBe(`This link is not valid or has expired — ask ${w.company.name} for a new one.`);
    // A Spanish browser reads the same refusal in Spanish.
    const spanish = await pdfRoute(
      new Request(`http://localhost/r/${expired}/pdf`, { headers: { 'accept-language': 'es-MX,es;q=0.9' } }),
      { params: Promise.resolve({ token: expired }) },
    );
    expect(spanish.status).toBe(410);
    expect(await spanish.text()).toBe(`Este enlace no es válido o ha caducado: pida uno nuevo a ${w.company.name}.`);
  });

  it('answers a signed link to a job that does not exist or is not approved exactly like a forged one', async () => {
    const w = await makeWorld('Link');
    const missing = await openReportLink(unrecordedToken('00000000-0000-4000-8000-000000000000', w.company.id));
    const notApproved = await openReportLink(await tokenFor(w.job.id, w.company.id));
    const foreign = await makeApprovedJob('e@example.test');
    const crossCompany = await openReportLink(await tokenFor(foreign.job.id, w.company.id));
    for (const answer of [missing, notApproved, crossCompany])
      expect(answer).toEqual({ ok: false, status: 404, companyName: null });
    await Job.update({ status: 'reported' }, { where: { id: foreign.job.id } });
    expect((await openReportLink(await tokenFor(foreign.job.id, foreign.company.id))).ok).toBe(true);
  });
});
