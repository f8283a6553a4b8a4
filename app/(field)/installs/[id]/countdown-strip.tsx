'use client';

import { useEffect, useRef } from 'react';
import { Countdown } from '@/components/install/countdown';
import { alarmsDue } from '@/lib/client/countdown';
import { notify, soundAlarm, vibrate } from '@/lib/client/alarm';
import { useTranslations } from 'next-intl';
import type { CurePlan } from '@/lib/cure';
import { formatInZone } from '@/lib/time/dates';
import type { InstallState } from '@/lib/install/state';

type Deadline = { key: string; label: string; start: Date; deadline: Date };
type DeadlineWords = (
  key: 'returnToService' | 'safeInflateBy' | 'inflateBy' | 'deflateMaker' | 'deflateReserve' | 'deflate',
  values?: { pct: number },
) => string;

const ENGLISH: Record<string, string> = {
  returnToService: 'Return to service',
  safeInflateBy: 'Inflate by (keeping the reserve)',
  inflateBy: 'Working time ends',
  deflateMaker: "Deflate after (maker's hold)",
  deflate: 'Deflate after',
};
/** The English names, for callers without the `install.deadlines` messages (tests of the clock rules). */
const english: DeadlineWords = (key, values) =>
  key === 'deflateReserve' ? `Deflate after (hold + ${values?.pct} %)` : ENGLISH[key];

/** The running clocks of this install, with their alarms: before inflating, then while holding. */
export function deadlinesOf(state: InstallState, plan: CurePlan | null, t: DeadlineWords = english): Deadline[] {
  // A signed-off install is a record: its outcome is shown, no clock runs on.
  if (state.signedOffAt) return [];
  if (!plan || !state.mixedAt || state.deflatedAt) {
    if (plan?.returnToService && state.inflatedAt) {
      return [
        {
          key: 'returnToService',
          label: t('returnToService'),
          start: state.inflatedAt,
          deadline: plan.returnToService,
        },
      ];
    }
    return [];
  }
  if (!state.inflatedAt) {
    return [
      { key: 'safeInflateBy', label: t('safeInflateBy'), start: state.mixedAt, deadline: plan.safeInflateBy },
      { key: 'inflateBy', label: t('inflateBy'), start: state.mixedAt, deadline: plan.inflateBy },
    ];
  }
  return [
    ...(plan.deflateAfter
      ? [{ key: 'deflateAfter', label: deflateLabel(plan, t), start: state.inflatedAt, deadline: plan.deflateAfter }]
      : []),
    ...(plan.returnToService
      ? [
          {
            key: 'returnToService',
            label: t('returnToService'),
            start: state.inflatedAt,
            deadline: plan.returnToService,
          },
        ]
      : []),
  ];
}

export function ClockStrip({ deadlines, now, timeZone }: { deadlines: Deadline[]; now: Date; timeZone: string }) {
  const t = useTranslations('alarms');
  const fired = useRef(new Set<string>());
  useEffect(() => {
    for (const d of deadlines) {
      for (const alarm of alarmsDue({
        now,
        deadline: d.deadline,
        start: d.start,
        id: d.key,
        alreadyFired: fired.current,
      })) {
        fired.current.add(alarm.key);
        soundAlarm(alarm.kind === 'five-minutes' ? 'warning' : 'urgent');
        vibrate();
        const message = t(alarm.kind);
        void notify(
          t('title', { clock: d.label, message }),
          t('body', { clock: d.label.toLowerCase(), time: formatInZone(d.deadline, timeZone, 'HH:mm zzz') }),
          alarm.key,
        );
      }
    }
  }, [deadlines, now, timeZone, t]);
  if (deadlines.length === 0) return null;
  return (
    <div className="grid gap-3 sm:grid-cols-2" data-testid="clock-strip">
      {deadlines.map((d) => (
        <Countdown key={d.key} label={d.label} start={d.start} deadline={d.deadline} now={now} timeZone={timeZone} />
      ))}
    </div>
  );
}

/** Says what the deflate countdown runs to: the resin's hold with the company's reserve, or the maker's hold. */
function deflateLabel(plan: CurePlan, t: DeadlineWords): string {
  if (plan.holdSource === 'maker') return t('deflateMaker');
  return plan.holdReserve > 0 ? t('deflateReserve', { pct: Math.round(plan.holdReserve * 100) }) : t('deflate');
}
