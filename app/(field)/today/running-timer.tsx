'use client';

import { Countdown, useNow } from '@/components/install/countdown';

/** The countdown of an install already running, visible from the list. */
export function RunningClock({
  label,
  start,
  at,
  timeZone,
}: {
  label: string;
  start: string;
  at: string;
  timeZone: string;
}) {
  const now = useNow(1000);
  return <Countdown label={label} start={new Date(start)} deadline={new Date(at)} now={now} timeZone={timeZone} />;
}
