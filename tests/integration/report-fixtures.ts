import { execFile } from 'node:child_process';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import { randomUUID } from 'node:crypto';
import { Install, Job, ReportLink } from '@/models';
import { linkExpiry, signReportLink } from '@/lib/report/link';
import { cleanInstall, postAll, startInstall } from './helpers/installs';
import { signInAs } from './helpers/session';
import { makeInstallWorld } from './helpers/world';

/**
 * A company whose job has one finished install, approved by the office (set on the rows: the review
 * screen is not part of this branch), and whose customer has the given e-mail.
 */
export async function makeApprovedJob(customerEmail: string | null) {
  const w = await makeInstallWorld('Report');
  await w.customer.update({ email: customerEmail });
  await signInAs(w.foreman);
  const installId = await startInstall(w);
  await postAll(installId, cleanInstall(w));
  await Install.update({ status: 'approved' }, { where: { id: installId } });
  await Job.update({ status: 'approved' }, { where: { id: w.job.id } });
  await w.job.reload();
  return { ...w, installId };
}

/** The text of a PDF, as poppler's pdftotext reads it (whitespace folded to single spaces). */
export async function pdfText(pdf: Buffer): Promise<string> {
  const dir = await mkdtemp(path.join(tmpdir(), 'setline-pdf-'));
  try {
    const file = path.join(dir, 'report.pdf');
    await writeFile(file, pdf);
    const { stdout } = await promisify(execFile)('pdftotext', ['-enc', 'UTF-8', file, '-']);
    return stdout.replace(/\s+/g, ' ');
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

/** Waits until `probe` returns a value that is not undefined, or fails after `ms`. */
export async function eventually<T>(
  probe: () => Promise<T | undefined>,
  ms = 20_000,
  what = 'the condition',
): Promise<T> {
  const until = Date.now() + ms;
  for (;;) {
    const value = await probe();
    if (value !== undefined) return value;
    if (Date.now() > until) throw new Error(`Timed out waiting for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}

/** A customer link of the job: a link row of its own and the signed token naming it. */
export async function linkToken(jobId: string, companyId: string, expiresAt = linkExpiry()) {
  const link = await ReportLink.create({ companyId, jobId, expiresAt });
  return signReportLink({ linkId: link.id, jobId, companyId, expiresAt });
}

/** A well-signed token whose link row does not exist. */
export const unrecordedToken = (jobId: string, companyId: string, expiresAt = linkExpiry()) =>
  signReportLink({ linkId: randomUUID(), jobId, companyId, expiresAt });
