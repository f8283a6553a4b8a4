'use client';

import { useTranslations } from 'next-intl';
import { useEffect, useState } from 'react';
import { countdownState, type CountdownTone } from '@/lib/client/countdown';
import { serverNow } from '@/lib/client/server-time';
import { formatInZone } from '@/lib/time/dates';
import { formatDuration } from '@/lib/units';

// The words for each tone are in the `countdown` message namespace, under the tone's name.
const TONES: Record<CountdownTone, { box: string; digits: string }> = {
  neutral: { box: 'border-slate-300 bg-white', digits: 'text-brand-800' },
  near: { box: 'border-near-500 bg-near-100', digits: 'text-near-700' },
  missed: { box: 'border-missed-600 bg-missed-100', digits: 'text-missed-700' },
};

/**
 * One install clock, readable at arm's length: large digits that keep their width while they
 * change, coloured by how close the deadline is. `now` comes from the parent (useNow) so that
 * every clock on a screen ticks together.
 */
export function Countdown({
  label,
  start,
  deadline,
  now,
  timeZone,
  compact = false,
}: {
  label: string;
  start: Date;
  deadline: Date;
  now: Date;
  /** The company's IANA zone for the clock time of the deadline (default: the tablet's). */
  timeZone?: string;
  /** Smaller digits, for a board with many clocks on one screen. */
  compact?: boolean;
}) {
  const t = useTranslations('countdown');
  const { tone, label: left, remainingMs } = countdownState({ now, start, deadline });
  const digits = tone === 'missed' ? t('over', { time: formatDuration(Math.ceil(-remainingMs / 1000)) }) : left;
  const style = TONES[tone];
  const Box = compact ? 'div' : 'section';
  return (
    // On a board many clocks share a label, so there each is a labelled group, not a landmark of its own.
    <Box
      role={compact ? 'group' : undefined}
      className={`rounded-xl border-2 ${compact ? 'p-3' : 'p-4'} ${style.box}`}
      data-tone={tone}
      data-testid="countdown"
      aria-label={label}
    >
      <div className="flex items-baseline justify-between gap-2">
        <h3 className="text-lg font-semibold text-slate-800">{label}</h3>
        <time className="text-base text-slate-600" dateTime={deadline.toISOString()} suppressHydrationWarning>
          {formatClockTime(deadline, timeZone)}
        </time>
      </div>
      {/* The server renders a moment earlier than the browser hydrates: the digits differ by design. */}
      <p
        role="timer"
        className={`mt-1 font-bold tabular-nums tracking-tight ${compact ? 'text-3xl' : 'text-5xl sm:text-6xl'} ${style.digits}`}
        suppressHydrationWarning
      >
        {digits}
      </p>
      {/* Announced when the tone changes only; reading every second would drown a screen reader. */}
      <p className="sr-only" aria-live="polite" suppressHydrationWarning>
        {`${label}: ${t(tone)}`}
      </p>
    </Box>
  );
}

/**
 * The present by the server-corrected clock, re-rendering every `intervalMs`. Ticks land on
 * whole intervals of that clock, so every countdown on a screen changes its digits together,
 * and a page back in view catches up at once (hidden pages have their timers slowed).
 */
export function useNow(intervalMs = 1000): Date {
  const [now, setNow] = useState(serverNow);

  useEffect(() => {
    let timer: ReturnType<typeof setTimeout> | undefined;
    const tick = () => {
      const current = serverNow();
      setNow(current);
      clearTimeout(timer);
      // A few ms past the boundary, so the rounded-up seconds have already changed.
      timer = setTimeout(tick, intervalMs - (current.getTime() % intervalMs) + 5);
    };
    const onVisible = () => {
      if (document.visibilityState === 'visible') tick();
    };
    tick();
    document.addEventListener('visibilitychange', onVisible);
    return () => {
      clearTimeout(timer);
      document.removeEventListener('visibilitychange', onVisible);
    };
  }, [intervalMs]);

  return now;
}

function formatClockTime(date: Date, timeZone?: string): string {
  // The company's zone and 24-hour clock, as in the event log and the flags.
  if (timeZone) return formatInZone(date, timeZone, 'HH:mm');
  return date.toLocaleTimeString(undefined, { hour: '2-digit', minute: '2-digit', timeZone });
}
