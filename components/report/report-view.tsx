import type { ReactNode } from 'react';
import { translatorFor } from '@/i18n/translator';
import { formatDay } from '@/lib/time/dates-locale';
import type { ReportData, ReportImage } from '@/lib/data/report';
import { TimelineSvg } from './timeline-svg';
import { cardClass } from '@/components/ui/card';

/** The read-only repair report as a web page (the customer's link), in the customer's language; the PDF shows the same data. */
export function ReportView({
  data,
  pdfHref,
  invoiceSlot,
}: {
  data: ReportData;
  pdfHref: string;
  invoiceSlot?: ReactNode;
}) {
  const t = translatorFor(data.locale, 'report');
  return (
    <article lang={data.locale} className="mx-auto max-w-3xl space-y-6 p-6 text-slate-900">
      <header className="border-b-2 border-brand-700 pb-3">
        <p className="font-semibold text-brand-700">{data.company.name}</p>
        <h1 className="text-2xl font-bold">{t('title', { number: data.job.number })}</h1>
        {data.job.title && <p className="text-slate-600">{data.job.title}</p>}
        <a
          href={pdfHref}
          className="mt-3 inline-block rounded-md bg-brand-700 px-4 py-2 text-sm font-medium text-white hover:bg-brand-800"
        >
          {t('download')}
        </a>
      </header>
      <dl className="grid grid-cols-1 gap-3 text-sm sm:grid-cols-2">
        <Item name={t('customer')}>{data.customer.name}</Item>
        <Item name={t('site')}>
          {data.site.name} — {data.site.address}
        </Item>
        <Item name={t('workDate')}>
          {data.job.scheduledDate ? formatDay(data.job.scheduledDate, data.locale) : '—'}
        </Item>
        <Item name={t('prepared')}>{data.preparedAt}</Item>
      </dl>

      <section aria-labelledby="repairs-heading" className="space-y-4">
        <h2 id="repairs-heading" className="text-lg font-semibold text-brand-700">
          {t('repairsHeading', { count: data.repairs.length })}
        </h2>
        {data.repairs.map((repair) => (
          <section key={repair.id} aria-label={t('repair', { position: repair.position })} className={cardClass}>
            <h3 className="font-semibold">
              {t('repairHeading', {
                position: repair.position,
                defect: repair.defect,
                length: repair.defectLength,
                grade: repair.conditionGrade,
              })}
            </h3>
            <dl className="mt-2 grid grid-cols-1 gap-2 text-sm sm:grid-cols-2">
              <Item name={t('where')}>
                {t('whereText', {
                  segment: repair.segment.label,
                  distance: repair.distance,
                  accessPoint: repair.accessPoint,
                })}
                {repair.clockPosition ? t('atClock', { clock: repair.clockPosition }) : ''}
              </Item>
              <Item name={t('pipe')}>
                {t('pipeText', { material: repair.segment.material, diameter: repair.segment.insideDiameter })}
              </Item>
              <Item name={t('patchLength')}>{repair.patchLength ?? '—'}</Item>
              <Item name={t('resin')}>
                {repair.install
                  ? t('resinText', { resin: repair.install.resinSystem ?? '—', lot: repair.install.kitLot ?? '—' })
                  : '—'}
              </Item>
              {repair.install && (
                <Item name={t('inspection')}>
                  {repair.install.inspection
                    ? `${repair.install.inspection.result === 'pass' ? t('passed') : t('notPassed')}${
                        repair.install.inspection.notes ? ` — ` + `${repair.install.inspection.notes}` : ''
                      }`
                    : t('notRecorded')}
                </Item>
              )}
              {repair.install?.returnToService && (
                <Item name={t('backInService')}>{repair.install.returnToService}</Item>
              )}
              {repair.install?.makerHold && (
                <Item name={t('holdTime')}>{t('makerHold', { hold: repair.install.makerHold })}</Item>
              )}
              {repair.earlierAttempts.length > 0 && (
                <Item name={t('earlier')}>
                  {repair.earlierAttempts
                    .map((a) => t('earlierText', { started: a.started ?? '—', outcome: a.outcome }))
                    .join('; ')}
                </Item>
              )}
            </dl>
            {repair.install && (
              <div className="mt-3">
                <p className="text-xs uppercase text-slate-500">{t('timeline', { zone: data.company.timeZone })}</p>
                <TimelineSvg
                  marks={repair.install.timeline.marks}
                  bands={repair.install.timeline.bands}
                  timeZone={data.company.timeZone}
                />
                <ol className="mt-1 flex flex-wrap gap-x-4 text-xs text-slate-600">
                  {repair.install.steps.map((step) => (
                    <li key={step.label}>
                      {step.label}: {step.at}
                    </li>
                  ))}
                </ol>
              </div>
            )}
            <Images images={repair.images} t={t} />
          </section>
        ))}
        <Images images={data.jobImages} t={t} />
      </section>

      {/* Invoice: the job's invoice and its payment link go here (added with invoicing). */}
      {invoiceSlot ?? null}

      <section aria-labelledby="cautions-heading" className="rounded-lg bg-near-100 p-4 text-sm">
        <h2 id="cautions-heading" className="mb-2 font-semibold">
          {t('cautions')}
        </h2>
        <ul className="space-y-1">
          {data.cautions.map((c) => (
            <li key={c.title}>
              <strong>{c.title}.</strong> {c.text}
            </li>
          ))}
        </ul>
        <p className="mt-2 text-slate-700">{data.deferral}</p>
      </section>
    </article>
  );
}

function Item({ name, children }: { name: string; children: ReactNode }) {
  return (
    <div>
      <dt className="text-xs uppercase text-slate-500">{name}</dt>
      <dd>{children}</dd>
    </div>
  );
}

function Images({ images, t }: { images: ReportImage[]; t: ReturnType<typeof translatorFor<'report'>> }) {
  if (images.length === 0) return null;
  return (
    <ul className="mt-3 grid grid-cols-2 gap-3 sm:grid-cols-3">
      {images.map((image) => (
        <li key={image.id} className="text-xs text-slate-600">
          {/* eslint-disable-next-line @next/next/no-img-element -- bytes inlined from storage; no image route for a customer link */}
          <img
            src={`data:image/${image.format === 'jpg' ? 'jpeg' : 'png'};base64,${image.data.toString('base64')}`}
            alt={`${t('imageAlt', { kind: kindOf(image.kind, t) })}${image.caption ? `: ${image.caption}` : ''}`}
            className="rounded ring-1 ring-slate-200"
          />
          {kindOf(image.kind, t)}
          {image.caption ? `: ${image.caption}` : ''}
        </li>
      ))}
    </ul>
  );
}

const kindOf = (kind: string, t: ReturnType<typeof translatorFor<'report'>>) =>
  kind === 'before' ? t('before') : kind === 'after' ? t('after') : t('inspectionImage');
