'use client';

import { useEffect, useRef } from 'react';
import { Countdown } from '@/components/install/countdown';
import { alarmsDue } from '@/lib/client/countdown';
import { notify, soundAlarm, vibrate } from '@/lib/client/alarm';
import type { CurePlan } from '@/lib/cure';
import { formatInZone } from '@/lib/time/dates';
import type { InstallState } from '@/lib/install/state';

type Deadline = { key: string; label: string; start: Date; deadline: Date };

/** The running clocks of this install, with their alarms: before inflating, then while holding. */
export function deadlinesOf(state: InstallState, plan: CurePlan | null): Deadline[] {
  // A signed-off install is a record: its outcome is shown, no clock runs on.
  if (state.signedOffAt) return [];
  if (!plan || !state.mixedAt || state.deflatedAt) {
    if (plan?.returnToService && state.inflatedAt) {
      return [{ key: 'returnToService', label: 'Return to service', start: state.inflatedAt, deadline: plan.returnToService }];
    }
    return [];
  }
  if (!state.inflatedAt) {
    return [
      { key: 'safeInflateBy', label: 'Inflate by (keeping the reserve)', start: state.mixedAt, deadline: plan.safeInflateBy },
      { key: 'inflateBy', label: 'Working time ends', start: state.mixedAt, deadline: plan.inflateBy },
    ];
  }
  return [
    ...(plan.deflateAfter ? [{ key: 'deflateAfter', label: deflateLabel(plan), start: state.inflatedAt, deadline: plan.deflateAfter }] : []),
    ...(plan.returnToService ? [{ key: 'returnToService', label: 'Return to service', start: state.inflatedAt, deadline: plan.returnToService }] : []),
  ];
}

export function ClockStrip({ deadlines, now, timeZone }: { deadlines: Deadline[]; now: Date; timeZone: string }) {
  const fired = useRef(new Set<string>());
  useEffect(() => {
    for (const d of deadlines) {
      for (const alarm of alarmsDue({ now, deadline: d.deadline, start: d.start, id: d.key, alreadyFired: fired.current })) {
        fired.current.add(alarm.key);
        soundAlarm(alarm.kind === 'five-minutes' ? 'warning' : 'urgent');
        vibrate();
        void notify(`${d.label}: ${alarm.message}`, `Install clock — ${d.label.toLowerCase()} at ${formatInZone(d.deadline, timeZone, 'HH:mm zzz')}`, alarm.key);
      }
    }
  }, [deadlines, now, timeZone]);
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
function deflateLabel(plan: CurePlan): string {
  if (plan.holdSource === 'maker') return "Deflate after (maker's hold)";
  return plan.holdReserve > 0 ? `Deflate after (hold + ${Math.round(plan.holdReserve * 100)} %)` : 'Deflate after';
}
