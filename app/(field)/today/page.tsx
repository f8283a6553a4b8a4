import type { Metadata } from 'next';
import Link from 'next/link';
import { KeepForOffline } from '@/components/shell/keep-for-offline';
import { getLocale, getTranslations } from 'next-intl/server';
import { FieldHeading } from '@/components/field/field-heading';
import { IntlScope } from '@/components/shell/intl-scope';
import { buttonVariants } from '@/components/ui/button';
import { labelIn } from '@/i18n/labels';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { listTodayJobs } from '@/lib/data/today';
import { FIELD_ROLES } from '@/lib/domain/vocabulary';
import { formatLength } from '@/lib/units';
import { RunningClock } from '@/app/(field)/today/running-timer';
import { StartInstallButton } from './start-install-button';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('today'))('metaTitle') };
}

export default async function Page() {
  const user = await requirePageUser(FIELD_ROLES);
  const [{ today, tomorrow, jobs }, company] = await Promise.all([listTodayJobs(user), getCompany(user)]);
  const [t, tl, locale] = await Promise.all([getTranslations('today'), getTranslations('labels'), getLocale()]);
  const units = company.unitSystem;
  // lib/data/today names the running clock in English; its words here are the reader's.
  const deadlineLabel = (english: string) => (t.has(`deadlines.${english}`) ? t(`deadlines.${english}`) : english);
  const length = (mm: number, kind?: 'long') => formatLength(mm, units, kind, { locale });
  // Today's and tomorrow's installs open without signal even if never opened on this tablet.
  const installIds = jobs.flatMap((job) =>
    job.repairs.flatMap((repair) => (repair.install ? [repair.install.id] : [])),
  );
  const keep = ['/today', ...installIds.flatMap((id) => [`/installs/${id}`, `/api/installs/${id}`])];
  return (
    <IntlScope namespaces={['today']}>
      <div className="space-y-4">
        <KeepForOffline urls={keep} userId={user.id} />
        <FieldHeading title={t('title')} />
        {jobs.length === 0 && <p className="rounded-xl bg-white p-6 text-slate-700">{t('none')}</p>}
        {jobs.map((job) => (
          <article
            key={job.id}
            className="rounded-xl bg-white p-5 shadow-sm ring-1 ring-slate-200"
            data-testid={`job-${job.number}`}
          >
            <p className="text-sm font-semibold uppercase tracking-wide text-brand-700">
              {job.scheduledDate === today
                ? t('today')
                : job.scheduledDate === tomorrow
                  ? t('tomorrow')
                  : labelIn(tl, job.status)}{' '}
              · {t('job', { number: job.number })}
            </p>
            <h2 className="text-2xl font-bold">
              {job.site?.addressLine}, {job.site?.city}
            </h2>
            <p className="text-slate-700">
              {job.customer?.name}
              {job.customer?.phone ? ` · ${job.customer.phone}` : ''}
            </p>
            {job.reviewComment && (
              <p className="mt-2 rounded-md bg-near-100 p-3 text-near-700" data-testid="review-comment">
                {t('office', { comment: job.reviewComment })}
              </p>
            )}
            {job.notes && <p className="mt-2 text-slate-700">{job.notes}</p>}
            <p className="mt-2 text-base">
              {t('accessPoints', {
                list: (job.site?.accessPoints ?? []).map((p) => `${p.label} (${labelIn(tl, p.kind)})`).join(', '),
              })}
            </p>
            <ul className="mt-3 space-y-3">
              {job.repairs.map((repair) => (
                <li key={repair.id} className="rounded-lg bg-slate-50 p-3">
                  <p className="text-lg font-semibold">
                    {t('repair', {
                      position: repair.position,
                      defect: labelIn(tl, repair.defectType),
                      distance: length(repair.distanceMm, 'long'),
                      segment: repair.segment?.label ?? '',
                    })}
                    {repair.clockPosition ? t('clock', { position: repair.clockPosition }) : ''}
                  </p>
                  <p className="text-base text-slate-700">
                    {t('defect', { length: length(repair.defectLengthMm), grade: repair.conditionGrade })}
                    {repair.plannedPatchLengthMm ? t('patch', { length: length(repair.plannedPatchLengthMm) }) : ''}
                  </p>
                  <div className="mt-2 space-y-2">
                    {repair.install?.deadline && (
                      <RunningClock
                        label={deadlineLabel(repair.install.deadline.label)}
                        start={repair.install.deadline.start}
                        at={repair.install.deadline.at}
                        timeZone={company.timeZone}
                      />
                    )}
                    {repair.install ? (
                      <Link
                        href={`/installs/${repair.install.id}`}
                        className={buttonVariants({
                          variant: repair.install.step === 'done' ? 'secondary' : 'primary',
                          size: 'field',
                        })}
                      >
                        {repair.install.step === 'done'
                          ? t('installStatus', { status: labelIn(tl, repair.install.status) })
                          : t('openInstall')}
                      </Link>
                    ) : (
                      <StartInstallButton repairId={repair.id} label={t('startInstall')} />
                    )}
                  </div>
                </li>
              ))}
            </ul>
          </article>
        ))}
      </div>
    </IntlScope>
  );
}
