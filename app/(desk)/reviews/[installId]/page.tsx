import type { Metadata } from 'next';
import Link from 'next/link';
import { AuditHistory } from '@/components/desk/audit-history';
import { FlagList } from '@/components/review/flag-badges';
import { TimelineChart } from '@/components/review/timeline-chart';
import { StatusBadge } from '@/components/ui/badge';
import { requirePageUser } from '@/lib/auth/session';
import { getInstallReview } from '@/lib/data/reviews';
import { formatInZone } from '@/lib/time/dates';
import { DESK_ROLES, label } from '@/lib/domain/vocabulary';
import { recordForPage } from '@/lib/server/page-record';
import { formatDuration, formatLength, formatPressure, formatTemperature } from '@/lib/units';
import { EventTimeline } from './event-timeline';
import { ReviewForm } from './review-form';
import { PageHeader } from '@/components/ui/page-header';
import { cardClass } from '@/components/ui/card';

export const metadata: Metadata = { title: 'Review install' };

export default async function Page({ params }: { params: Promise<{ installId: string }> }) {
  const user = await requirePageUser(DESK_ROLES);
  const r = await recordForPage((await params).installId, (id) => getInstallReview(user, id));
  const { unitSystem: units, timeZone } = r.company;
  const when = (at: Date | string | null | undefined) => (at ? formatInZone(at, timeZone) : '—');
  const { state, plan, repair } = r;
  const checks = state.log.find((e) => e.type === 'checks_done')?.payload.items as
    { id: string; ok: boolean; note?: string }[] | undefined;
  const template = r.options.checklist?.items ?? [];
  const kits = new Map(
    r.options.resinKits.map((k) => [k.id, `${k.lot} (${k.resinSystem.name}, expires ${k.expiresOn})`]),
  );
  const packers = new Map([
    ...r.options.packers.map((p) => [p.id, p.name] as const),
    ...(r.packer ? [[r.packer.id, r.packer.name] as const] : []),
  ]);

  return (
    <div className="space-y-6">
      <PageHeader
        back={{ href: '/reviews', label: 'Review' }}
        title={`Job ${r.job.number} · repair ${repair.position}`}
        actions={<StatusBadge status={r.install.status} />}
        description={
          <>
            <p>
              {r.customer.name} · {r.site.addressLine}, {r.site.city} · {label(repair.defectType)} at{' '}
              {formatLength(repair.distanceMm, units, 'long')}
              {repair.accessPoint ? ` from ${repair.accessPoint.label}` : ''} in {repair.segment.label}
              {repair.clockPosition ? ` · ${repair.clockPosition} o'clock` : ''} · {r.crew?.name ?? 'no crew'}
            </p>
            <p className="text-sm text-slate-600">
              Signed off {when(r.install.signedOffAt)} · install started {when(r.install.startedAt)}
            </p>
            {r.chain.replaces && (
              <p className="text-sm" data-testid="chain-replaces">
                Redo of{' '}
                <Link className="text-brand-700 underline" href={`/reviews/${r.chain.replaces.id}`}>
                  the install started {when(r.chain.replaces.startedAt ?? r.chain.replaces.createdAt)}
                </Link>
                {r.chain.replaces.inspectionResult === 'fail'
                  ? ' (inspection failed)'
                  : r.chain.replaces.status === 'sent_back'
                    ? ' (sent back)'
                    : ''}
              </p>
            )}
            {r.chain.replacedBy && (
              <p className="text-sm font-semibold text-near-700" data-testid="chain-replaced-by">
                Redone by{' '}
                <Link className="underline" href={`/reviews/${r.chain.replacedBy.id}`}>
                  a new install
                </Link>{' '}
                ({label(r.chain.replacedBy.status).toLowerCase()}); this one is kept as the record of the first attempt.
              </p>
            )}
          </>
        }
      />

      <section aria-labelledby="flags-heading" className="space-y-2">
        <h2 id="flags-heading" className="text-lg font-semibold">
          Quality flags
        </h2>
        <FlagList flags={r.flags} />
      </section>

      <section aria-labelledby="timeline-heading" className={cardClass}>
        <h2 id="timeline-heading" className="mb-2 text-lg font-semibold">
          Plan against reality
        </h2>
        <TimelineChart
          timeZone={timeZone}
          input={{
            mixedAt: state.mixedAt,
            safeInflateBy: plan?.safeInflateBy ?? null,
            inflateBy: plan?.inflateBy ?? null,
            inflatedAt: state.inflatedAt,
            deflateAfter: plan?.deflateAfter ?? null,
            deflatedAt: state.deflatedAt,
            returnToService: plan?.returnToService ?? null,
          }}
        />
      </section>

      <div className="grid gap-4 lg:grid-cols-2">
        <section aria-labelledby="conditions-heading" className={cardClass}>
          <h2 id="conditions-heading" className="mb-2 text-lg font-semibold">
            Conditions and materials
          </h2>
          <dl className="grid grid-cols-2 gap-x-4 gap-y-2 text-sm">
            <Item
              term="Resin temperature"
              value={r.install.mixTempC != null ? formatTemperature(r.install.mixTempC, units) : '—'}
            />
            <Item
              term="Air at the mixing place"
              value={state.conditions?.airTempC != null ? formatTemperature(state.conditions.airTempC, units) : '—'}
            />
            <Item
              term="Pipe temperature"
              value={r.install.pipeTempC != null ? formatTemperature(r.install.pipeTempC, units) : '—'}
            />
            <Item
              term="Dry run"
              value={state.dryRunSeconds != null ? formatDuration(state.dryRunSeconds) : 'none recorded'}
            />
            <Item
              term="Go decision"
              value={
                state.goDecision
                  ? state.goDecision.go
                    ? 'GO'
                    : `NO-GO overridden: “${state.goDecision.overrideReason ?? ''}”${
                        state.goDecision.makerHoldMin
                          ? `, maker's hold ` + `${formatDuration(state.goDecision.makerHoldMin * 60)}`
                          : ''
                      }`
                  : '—'
              }
            />
            <Item term="Counted for GO" value={plan?.counted ?? '—'} />
            <Item
              term="Resin system"
              value={r.resinSystem ? `${r.resinSystem.name} (${label(r.resinSystem.chemistry)})` : '—'}
            />
            <Item
              term="Kit lot and expiry"
              value={r.resinKit ? `${r.resinKit.lot}, expires ${r.resinKit.expiresOn}` : '—'}
            />
            <Item
              term="Packer"
              value={
                r.packer
                  ? `${r.packer.name}${r.packer.serial ? ` (${r.packer.serial})` : ''}, rated ` +
                    `${formatPressure(r.packer.minPressureKpa, units)}–${formatPressure(r.packer.maxPressureKpa, units)}`
                  : '—'
              }
            />
            <Item
              term="Patch length"
              value={r.install.patchLengthMm != null ? formatLength(r.install.patchLengthMm, units) : '—'}
            />
            <Item
              term="Pressures"
              value={
                state.pressuresKpa.length ? state.pressuresKpa.map((p) => formatPressure(p, units)).join(', ') : '—'
              }
            />
            <Item
              term="Working window"
              value={plan ? `${Math.round(plan.workingWindowMin)} min at the warmer of resin and air` : '—'}
            />
            <Item term="Hold / full cure" value={plan ? holdText(plan) : '—'} />
            <Item
              term="Inspection"
              value={
                state.inspection
                  ? `${state.inspection.result === 'pass' ? 'Pass' : 'Fail'}${state.inspection.notes ? `: ${state.inspection.notes}` : ''}`
                  : '—'
              }
            />
          </dl>
        </section>
        <section aria-labelledby="checks-heading" className={cardClass}>
          <h2 id="checks-heading" className="mb-2 text-lg font-semibold">
            Check-list answers
          </h2>
          {checks ? (
            <ul className="space-y-1 text-sm">
              {checks.map((answer) => (
                <li key={answer.id} className="flex gap-2">
                  <span className={answer.ok ? 'font-semibold text-safe-700' : 'font-semibold text-missed-700'}>
                    {answer.ok ? 'Yes' : 'No'}
                  </span>
                  <span>
                    {template.find((item) => item.id === answer.id)?.label ?? answer.id}
                    {answer.note ? ` — ${answer.note}` : ''}
                  </span>
                </li>
              ))}
            </ul>
          ) : (
            <p className="text-sm text-missed-700">The checks were not recorded on this install.</p>
          )}
        </section>
      </div>

      <EventTimeline
        log={r.log}
        timeZone={timeZone}
        unitSystem={units}
        kits={Object.fromEntries(kits)}
        packers={Object.fromEntries(packers)}
      />

      <section aria-labelledby="decision-heading" className={cardClass}>
        <h2 id="decision-heading" className="mb-2 text-lg font-semibold">
          Decision
        </h2>
        {r.install.status === 'awaiting_review' ? (
          <ReviewForm installId={r.install.id} />
        ) : (
          <p className="text-sm text-slate-600">
            This install is {label(r.install.status).toLowerCase()}: there is nothing to decide now.
          </p>
        )}
        {r.reviews.length > 0 && (
          <ol className="mt-3 space-y-1 text-sm">
            {r.reviews.map((review) => (
              <li key={review.id}>
                <StatusBadge status={review.decision} /> by {review.reviewerName ?? 'someone'} ·{' '}
                {when(review.createdAt)}
                {review.comment ? <> · “{review.comment}”</> : null}
              </li>
            ))}
          </ol>
        )}
      </section>

      <AuditHistory user={user} entityType="install" entityId={r.install.id} timeZone={timeZone} />
    </div>
  );
}

function Item({ term, value }: { term: string; value: string }) {
  return (
    <div>
      <dt className="text-slate-500">{term}</dt>
      <dd className="font-medium">{value}</dd>
    </div>
  );
}

/** Hold and full cure as the clock counted them: the resin's corrected times with the reserve, or the maker's hold. */
function holdText(plan: {
  holdMin: number | null;
  fullCureMin: number | null;
  keepInflatedMin: number | null;
  holdReserve: number;
  holdSource: string | null;
  makerHoldMin?: number;
}) {
  if (plan.holdMin === null) {
    return plan.holdSource === 'maker'
      ? `outside the rated range: maker's hold ${Math.round(plan.makerHoldMin ?? 0)} min, kept ${Math.round(plan.keepInflatedMin ?? 0)} min with the reserve`
      : "outside the rated range: no hold time (per the resin maker's sheet)";
  }
  const reserve =
    plan.holdReserve > 0
      ? `, kept ${Math.round(plan.keepInflatedMin ?? plan.holdMin)} min with the ${Math.round(plan.holdReserve * 100)} % reserve`
      : '';
  return `${Math.round(plan.holdMin)} min${reserve} / ${Math.round(plan.fullCureMin ?? 0)} min at the pipe temperature`;
}
