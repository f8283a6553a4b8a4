import type { Metadata } from 'next';
import Link from 'next/link';
import { buttonClass } from '@/components/ui/button';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { listTodayJobs } from '@/lib/data/today';
import { FIELD_ROLES, label } from '@/lib/domain/vocabulary';
import { formatLength } from '@/lib/units';
import { RunningClock } from './running-timer';
import { StartInstallButton } from './start-install-button';

export const metadata: Metadata = { title: 'Today' };

export default async function Page() {
  const user = await requirePageUser(FIELD_ROLES);
  const [{ today, tomorrow, jobs }, company] = await Promise.all([listTodayJobs(user), getCompany(user)]);
  const units = company.unitSystem;
  return (
    <div className="space-y-4">
      <h1 className="text-3xl font-bold">Today&apos;s work</h1>
      {jobs.length === 0 && <p className="rounded-xl bg-white p-6 text-slate-700">No jobs for your crew today or tomorrow.</p>}
      {jobs.map((job) => (
        <article key={job.id} className="rounded-xl bg-white p-5 shadow-sm ring-1 ring-slate-200" data-testid={`job-${job.number}`}>
          <p className="text-sm font-semibold uppercase tracking-wide text-brand-700">{job.scheduledDate === today ? 'Today' : job.scheduledDate === tomorrow ? 'Tomorrow' : label(job.status)} · Job {job.number}</p>
          <h2 className="text-2xl font-bold">{job.site?.addressLine}, {job.site?.city}</h2>
          <p className="text-slate-700">{job.customer?.name}{job.customer?.phone ? ` · ${job.customer.phone}` : ''}</p>
          {job.reviewComment && <p className="mt-2 rounded-md bg-near-100 p-3 text-near-700" data-testid="review-comment">Office: {job.reviewComment}</p>}
          {job.notes && <p className="mt-2 text-slate-700">{job.notes}</p>}
          <p className="mt-2 text-base">Access points: {(job.site?.accessPoints ?? []).map((p) => `${p.label} (${label(p.kind)})`).join(', ')}</p>
          <ul className="mt-3 space-y-3">
            {job.repairs.map((repair) => (
              <li key={repair.id} className="rounded-lg bg-slate-50 p-3">
                <p className="text-lg font-semibold">
                  Repair {repair.position}: {label(repair.defectType)} at {formatLength(repair.distanceMm, units, 'long')} in {repair.segment?.label}
                  {repair.clockPosition ? ` · ${repair.clockPosition} o'clock` : ''}
                </p>
                <p className="text-base text-slate-700">
                  Defect {formatLength(repair.defectLengthMm, units)} · grade {repair.conditionGrade}
                  {repair.plannedPatchLengthMm ? ` · patch ${formatLength(repair.plannedPatchLengthMm, units)}` : ''}
                </p>
                <div className="mt-2 space-y-2">
                  {repair.install?.deadline && <RunningClock label={repair.install.deadline.label} start={repair.install.deadline.start} at={repair.install.deadline.at} timeZone={company.timeZone} />}
                  {repair.install ? (
                    <Link href={`/installs/${repair.install.id}`} className={buttonClass(repair.install.step === 'done' ? 'secondary' : 'primary', 'field')}>
                      {repair.install.step === 'done' ? `Install: ${label(repair.install.status)}` : 'Open install'}
                    </Link>
                  ) : (
                    <StartInstallButton repairId={repair.id} label="Start install" />
                  )}
                </div>
              </li>
            ))}
          </ul>
        </article>
      ))}
    </div>
  );
}
