import type { ReactNode } from 'react';
import type { ReportData, ReportImage } from '@/lib/data/report';
import { TimelineSvg } from './timeline-svg';

/** The read-only repair report as a web page (the customer's link); the PDF shows the same data. */
export function ReportView({ data, pdfHref, invoiceSlot }: { data: ReportData; pdfHref: string; invoiceSlot?: ReactNode }) {
  return (
    <article className="mx-auto max-w-3xl space-y-6 p-6 text-slate-900">
      <header className="border-b-2 border-brand-700 pb-3">
        <p className="font-semibold text-brand-700">{data.company.name}</p>
        <h1 className="text-2xl font-bold">Repair report · Job {data.job.number}</h1>
        {data.job.title && <p className="text-slate-600">{data.job.title}</p>}
        <a href={pdfHref} className="mt-3 inline-block rounded-md bg-brand-700 px-4 py-2 text-sm font-medium text-white hover:bg-brand-800">
          Download PDF
        </a>
      </header>
      <dl className="grid grid-cols-1 gap-3 text-sm sm:grid-cols-2">
        <Item name="Customer">{data.customer.name}</Item>
        <Item name="Site">{data.site.name} — {data.site.address}</Item>
        <Item name="Work date">{data.job.scheduledDate ?? '—'}</Item>
        <Item name="Report prepared">{data.preparedAt}</Item>
      </dl>

      <section aria-labelledby="repairs-heading" className="space-y-4">
        <h2 id="repairs-heading" className="text-lg font-semibold text-brand-700">Repairs ({data.repairs.length})</h2>
        {data.repairs.map((repair) => (
          <section key={repair.id} aria-label={`Repair ${repair.position}`} className="rounded-lg bg-white p-4 ring-1 ring-slate-200">
            <h3 className="font-semibold">Repair {repair.position}: {repair.defect} ({repair.defectLength}, grade {repair.conditionGrade})</h3>
            <dl className="mt-2 grid grid-cols-1 gap-2 text-sm sm:grid-cols-2">
              <Item name="Where">Segment {repair.segment.label}, {repair.distance} from {repair.accessPoint}{repair.clockPosition ? `, at ${repair.clockPosition}` : ''}</Item>
              <Item name="Pipe">{repair.segment.material}, {repair.segment.insideDiameter} inside diameter</Item>
              <Item name="Patch length">{repair.patchLength ?? '—'}</Item>
              <Item name="Resin">{repair.install ? `${repair.install.resinSystem ?? '—'}, kit lot ${repair.install.kitLot ?? '—'}` : '—'}</Item>
              {repair.install && (
                <Item name="Inspection">
                  {repair.install.inspection ? `${repair.install.inspection.result === 'pass' ? 'Passed' : 'Did not pass'}${repair.install.inspection.notes ? ` — ${repair.install.inspection.notes}` : ''}` : 'Not recorded'}
                </Item>
              )}
              {repair.install?.returnToService && <Item name="Line back in service after">{repair.install.returnToService}</Item>}
              {repair.install?.makerHold && (
                <Item name="Hold time">{repair.install.makerHold}, from the resin maker&apos;s sheet: the pipe was outside the resin&apos;s rated temperature range</Item>
              )}
              {repair.earlierAttempts.length > 0 && (
                <Item name="Earlier attempts">{repair.earlierAttempts.map((a) => `started ${a.started ?? '—'}, ${a.outcome}, redone`).join('; ')}</Item>
              )}
            </dl>
            {repair.install && (
              <div className="mt-3">
                <p className="text-xs uppercase text-slate-500">Install timeline ({data.company.timeZone})</p>
                <TimelineSvg marks={repair.install.timeline.marks} bands={repair.install.timeline.bands} timeZone={data.company.timeZone} />
                <ol className="mt-1 flex flex-wrap gap-x-4 text-xs text-slate-600">
                  {repair.install.steps.map((step) => <li key={step.label}>{step.label}: {step.at}</li>)}
                </ol>
              </div>
            )}
            <Images images={repair.images} />
          </section>
        ))}
        <Images images={data.jobImages} />
      </section>

      {/* Invoice: the job's invoice and its payment link go here (added with invoicing). */}
      {invoiceSlot ?? null}

      <section aria-labelledby="cautions-heading" className="rounded-lg bg-near-100 p-4 text-sm">
        <h2 id="cautions-heading" className="mb-2 font-semibold">Cautions</h2>
        <ul className="space-y-1">
          {data.cautions.map((c) => <li key={c.title}><strong>{c.title}.</strong> {c.text}</li>)}
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

function Images({ images }: { images: ReportImage[] }) {
  if (images.length === 0) return null;
  return (
    <ul className="mt-3 grid grid-cols-2 gap-3 sm:grid-cols-3">
      {images.map((image) => (
        <li key={image.id} className="text-xs text-slate-600">
          {/* eslint-disable-next-line @next/next/no-img-element -- bytes inlined from storage; no image route for a customer link */}
          <img src={`data:image/${image.format === 'jpg' ? 'jpeg' : 'png'};base64,${image.data.toString('base64')}`} alt={`${image.kind} image${image.caption ? `: ${image.caption}` : ''}`} className="rounded ring-1 ring-slate-200" />
          {image.kind === 'before' ? 'Before' : image.kind === 'after' ? 'After' : 'Inspection'}{image.caption ? `: ${image.caption}` : ''}
        </li>
      ))}
    </ul>
  );
}
