import 'server-only';
import { createHash } from 'node:crypto';
import { reportVersionInputs } from '@/lib/data/report-delivery';
import { headObject, putObject, readObject } from '@/lib/storage/s3';
import { buildReportData, type ReportData } from '@/lib/data/report';
import { renderReportPdf, reportFileName } from './pdf';

export { reportFileName };

// The customer's PDF is rendered once per report version and kept in object storage, so the link's
// /pdf route serves stored bytes instead of rendering (with every image) on each hit. The version is
// a digest of what the PDF shows (the report data without its "prepared" time), the job's evidence
// rows and the newest sent report: changed data or a new report send make a new version.

const PREFIX = 'report-pdf';

/** The PDF of the job's current report version: from storage when rendered before, else rendered and stored. */
export async function cachedReportPdf(
  companyId: string,
  jobId: string,
  given: { data?: ReportData } = {},
): Promise<Buffer> {
  const version = await reportVersion(companyId, jobId);
  const key = version ? `${PREFIX}/${companyId}/${jobId}/${version}.pdf` : null;
  if (key) {
    const stored = await fromStorage(key);
    if (stored) return stored;
  }
  const data = given.data ?? (await buildReportData(companyId, jobId));
  if (!data) throw new Error('The job of this report no longer exists.');
  const pdf = await renderReportPdf(data);
  if (key) {
    // A storage hiccup costs a render next time, never the answer.
    await putObject(key, pdf, 'application/pdf').catch((error) =>
      console.error('[report] PDF not cached', key, messageOf(error)),
    );
  }
  return pdf;
}

/** The report version of a job (hex digest), or null when the job is not there. Reads rows only, no images. */
export async function reportVersion(companyId: string, jobId: string): Promise<string | null> {
  const [data, inputs] = await Promise.all([
    buildReportData(companyId, jobId, { images: false }),
    reportVersionInputs(companyId, jobId),
  ]);
  if (!data) return null;
  const digest = createHash('sha256');
  digest.update(JSON.stringify({ ...data, preparedAt: null }));
  digest.update(JSON.stringify(inputs.evidence));
  digest.update(inputs.lastSendId ?? '-');
  return digest.digest('hex').slice(0, 40);
}

async function fromStorage(key: string): Promise<Buffer | null> {
  try {
    if (!(await headObject(key))) return null;
    const bytes = await readObject(key);
    return bytes.length > 0 ? bytes : null;
  } catch (error) {
    console.error('[report] cached PDF not readable', key, messageOf(error));
    return null;
  }
}

const messageOf = (error: unknown) => (error instanceof Error ? error.message : String(error));
