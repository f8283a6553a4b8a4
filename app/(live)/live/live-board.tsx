'use client';

import { useCallback, useEffect, useRef, useState, useSyncExternalStore } from 'react';
import useSWR from 'swr';
import { Countdown, useNow } from '@/components/install/countdown';
import { buttonVariants } from '@/components/ui/button';
import { installAudioUnlock, soundAlarm } from '@/lib/client/alarm';
import { alertsToRaise, runningClock } from '@/lib/client/board-alerts';
import { countdownState, type CountdownTone } from '@/lib/client/countdown';
import { fetchJson } from '@/lib/client/fetch-json';
import {
  refreshIntervalFor,
  useLiveStream,
  type LiveStreamEvent,
  type LiveStreamStatus,
} from '@/lib/client/live-stream';
import type { LiveBoard as Board, LiveBoardInstall } from '@/lib/data/live-board';
import { formatInZone } from '@/lib/time/dates';
import { label } from '@/lib/domain/vocabulary';
import { formatLength } from '@/lib/units';

const BOARD_URL = '/api/live/board';
const MUTE_KEY = 'setline.live-muted';
const MAX_ALERTS = 8;

/** What the crew is at, by the install's next step. */
const STEP_WORDS: Record<string, string> = {
  safety: 'Safety briefing',
  checks: 'Pre-install checks',
  dry_run: 'Dry run',
  conditions: 'Recording conditions',
  mix: 'Ready to mix',
  load: 'Resin mixed, loading the patch',
  position: 'Patch loaded, placing the packer',
  inflate: 'Packer in position, inflating',
  hold: 'Bladder inflated, holding',
  inspect: 'Bladder deflated, inspecting',
  sign_off: 'Inspected, to sign off',
  done: 'Signed off',
};

const STREAM_WORDS: Record<LiveStreamStatus, string> = {
  live: 'Live: updates arrive as the crews tap',
  connecting: 'Connecting… refreshing every 5 seconds meanwhile',
  polling: 'No live connection: refreshing every 5 seconds',
};

type BoardAlert = { key: string; tone: CountdownTone; text: string };

const ALERT_TONES: Record<CountdownTone, string> = {
  neutral: 'border-slate-300 bg-white text-slate-800',
  near: 'border-near-500 bg-near-100 text-near-700',
  missed: 'border-missed-600 bg-missed-100 text-missed-700',
};

/** The live board: installs in progress with their running clock, alerts when one turns amber or red, done today. */
export function LiveBoard({ initial }: { initial: Board }) {
  const revalidate = useRef<() => void>(() => undefined);
  const patch = useRef<(event: LiveStreamEvent) => void>(() => undefined);
  const stream = useLiveStream(
    (event) => patch.current(event),
    () => revalidate.current(),
  );
  const { data, mutate } = useSWR<Board>(BOARD_URL, (url: string) => fetchJson<Board>(url), {
    fallbackData: initial,
    refreshInterval: refreshIntervalFor(stream),
    revalidateOnFocus: true,
  });
  useEffect(() => {
    revalidate.current = () => void mutate();
    // The tap's new step shows at once; the refetch then brings its deadlines (and moves a finished one).
    patch.current = (event) => void mutate((board) => board && withStep(board, event), { revalidate: true });
  }, [mutate]);
  const board = data ?? initial;
  const now = useNow(1000);
  const { alerts, dismiss, muted, toggleMute } = useBoardAlerts(board, now);

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-2xl font-bold">Live</h1>
          <p className="text-sm text-slate-600" data-testid="live-status" data-stream={stream}>
            {STREAM_WORDS[stream]} · times in {board.timeZone}
          </p>
        </div>
        <button
          type="button"
          onClick={toggleMute}
          aria-pressed={muted}
          className={buttonVariants({ variant: 'secondary' })}
        >
          {muted ? 'Alert sound off' : 'Alert sound on'}
        </button>
      </div>

      <div role="alert" aria-live="assertive" className="space-y-2" data-testid="live-alerts">
        {alerts.map((alert) => (
          <div
            key={`${alert.key}:${alert.tone}`}
            data-testid="live-alert"
            data-tone={alert.tone}
            className={`flex items-center justify-between gap-3 rounded-md border-2 p-3 font-semibold ${ALERT_TONES[alert.tone]}`}
          >
            <span>{alert.text}</span>
            <button type="button" onClick={() => dismiss(alert)} className="rounded px-2 py-1 text-sm underline">
              Dismiss
            </button>
          </div>
        ))}
      </div>

      <section aria-labelledby="in-progress">
        <h2 id="in-progress" className="mb-3 text-lg font-semibold">
          In progress ({board.inProgress.length})
        </h2>
        {board.inProgress.length === 0 ? (
          <p className="text-slate-600">No install is running right now.</p>
        ) : (
          <ul className="grid gap-4 md:grid-cols-2 xl:grid-cols-3">
            {board.inProgress.map((install) => (
              <InstallCard key={install.id} install={install} board={board} now={now} />
            ))}
          </ul>
        )}
      </section>

      <section aria-labelledby="done-today">
        <h2 id="done-today" className="mb-3 text-lg font-semibold">
          Done today ({board.doneToday.length})
        </h2>
        {board.doneToday.length === 0 ? (
          <p className="text-slate-600">Nothing signed off yet today.</p>
        ) : (
          <table className="w-full bg-white text-left text-sm">
            <thead className="bg-slate-50 text-slate-700">
              <tr>
                <th className="px-3 py-2">Crew</th>
                <th className="px-3 py-2">Job</th>
                <th className="px-3 py-2">Repair</th>
                <th className="px-3 py-2">Signed off</th>
                <th className="px-3 py-2">Status</th>
              </tr>
            </thead>
            <tbody>
              {board.doneToday.map((install) => (
                <tr
                  key={install.id}
                  data-testid="live-done"
                  data-install-id={install.id}
                  className="border-t border-slate-200"
                >
                  <td className="px-3 py-2">{install.crew?.name ?? 'No crew'}</td>
                  <td className="px-3 py-2">{install.job.number}</td>
                  <td className="px-3 py-2">{repairText(install, board)}</td>
                  <td className="px-3 py-2">
                    {install.finishedAt ? formatInZone(install.finishedAt, board.timeZone, 'HH:mm') : ''}
                  </td>
                  <td className="px-3 py-2">{label(install.status)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>

      <p className="text-sm text-slate-600">
        The board follows the clocks the crews tap; it does not replace the crew&apos;s own watch on the work.
        Confined-space entry, pressurised packers, resin handling and traffic control follow local codes, the resin and
        packer makers&apos; instructions and the competent person on site.
      </p>
    </div>
  );
}

function InstallCard({ install, board, now }: { install: LiveBoardInstall; board: Board; now: Date }) {
  const clock = runningClock(install);
  return (
    <li
      data-testid="live-install"
      data-install-id={install.id}
      data-step={install.step}
      className="space-y-2 rounded-lg bg-white p-4 shadow-sm ring-1 ring-slate-200"
    >
      <div className="flex items-baseline justify-between gap-2">
        <h3 className="font-semibold">{install.crew?.name ?? 'No crew'}</h3>
        <span className="text-sm text-slate-600">
          Job {install.job.number}
          {install.job.title ? ` · ${install.job.title}` : ''}
        </span>
      </div>
      <p className="text-sm text-slate-700">{repairText(install, board)}</p>
      <p className="font-medium" data-testid="live-step">
        {STEP_WORDS[install.step] ?? label(install.step)}
      </p>
      {clock && (
        <Countdown
          label={clock.label}
          start={clock.start}
          deadline={clock.deadline}
          now={now}
          timeZone={board.timeZone}
          compact
        />
      )}
      {install.inflatedAt && install.inflateBy && (
        <p className="text-sm text-slate-600">
          Inflated {formatInZone(install.inflatedAt, board.timeZone, 'HH:mm')} (inflate by{' '}
          {formatInZone(install.inflateBy, board.timeZone, 'HH:mm')})
        </p>
      )}
    </li>
  );
}

/** Raises an alert (and a sound, unless muted) when an install's running clock turns amber or red. */
function useBoardAlerts(board: Board, now: Date) {
  const seen = useRef(new Map<string, CountdownTone>());
  const [alerts, setAlerts] = useState<BoardAlert[]>([]);
  const muted = useSyncExternalStore(subscribeMuted, readMuted, () => false);
  const mutedRef = useRef(muted);
  useEffect(() => {
    mutedRef.current = muted;
  }, [muted]);
  useEffect(() => installAudioUnlock(), []);

  useEffect(() => {
    const current = board.inProgress.flatMap((install) => {
      const clock = runningClock(install);
      if (!clock) return [];
      const { tone } = countdownState({ now, start: clock.start, deadline: clock.deadline });
      return [{ key: `${install.id}:${clock.kind}`, tone, install, clock }];
    });
    const raised = alertsToRaise(seen.current, current);
    for (const { key, tone } of current) seen.current.set(key, tone);
    if (raised.length === 0) return;
    const fresh = raised.map(({ key, tone, install, clock }) => ({
      key,
      tone,
      text:
        `${install.crew?.name ?? 'No crew'}, job ${install.job.number}: ${clock.label.toLowerCase()} ` +
        `${formatInZone(clock.deadline, board.timeZone, 'HH:mm')}, ${tone === 'missed' ? 'time is up' : 'deadline near'}`,
    }));
    setAlerts((list) => [...fresh, ...list.filter((a) => !fresh.some((f) => f.key === a.key))].slice(0, MAX_ALERTS));
    if (!mutedRef.current) soundAlarm(fresh.some((a) => a.tone === 'missed') ? 'urgent' : 'warning');
  }, [board, now]);

  const dismiss = useCallback((alert: BoardAlert) => setAlerts((list) => list.filter((a) => a !== alert)), []);
  const toggleMute = useCallback(() => {
    mutedRef.current = !mutedRef.current;
    writeMuted(mutedRef.current);
  }, []);
  return { alerts, dismiss, muted, toggleMute };
}

// The mute switch is kept in localStorage (shared by the board's tabs); the memory copy serves when storage is off.
const muteListeners = new Set<() => void>();
let mutedInMemory = false;

function subscribeMuted(listener: () => void) {
  muteListeners.add(listener);
  window.addEventListener('storage', listener);
  return () => {
    muteListeners.delete(listener);
    window.removeEventListener('storage', listener);
  };
}

function readMuted(): boolean {
  try {
    const stored = globalThis.localStorage?.getItem(MUTE_KEY);
    return stored == null ? mutedInMemory : stored === 'true';
  } catch {
    return mutedInMemory;
  }
}

function writeMuted(value: boolean) {
  mutedInMemory = value;
  try {
    globalThis.localStorage?.setItem(MUTE_KEY, String(value));
  } catch {
    // Storage may be off: the memory copy holds for this page.
  }
  for (const listener of muteListeners) listener();
}

function withStep(board: Board, event: LiveStreamEvent): Board {
  const patchOne = (install: LiveBoardInstall) =>
    install.id === event.installId
      ? { ...install, step: event.step as LiveBoardInstall['step'], status: event.status }
      : install;
  return { ...board, inProgress: board.inProgress.map(patchOne) };
}

function repairText(install: LiveBoardInstall, board: Board) {
  const where = install.repair.segmentLabel ? ` in ${install.repair.segmentLabel}` : '';
  const distance = formatLength(install.repair.distanceMm, board.unitSystem, 'long');
  return `Repair ${install.repair.position}: ${label(install.repair.defectType)} at ${distance}${where}`;
}
