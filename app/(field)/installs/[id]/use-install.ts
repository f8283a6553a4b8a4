'use client';

import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import useSWR from 'swr';
import type { InstallViewResponse } from '@/lib/data/installs';
import { deriveInstallState, type InstallEventInput } from '@/lib/install/state';
import { fetchJson } from '@/lib/client/fetch-json';
import { refreshIntervalFor, useLiveStream } from '@/lib/client/live-stream';
import { loadOutbox } from '@/lib/client/load-outbox';
import type { OutboxEntry, OutboxUser } from '@/lib/client/outbox';
import { serverNow } from '@/lib/client/server-time';
import type { InstallEventType } from '@/lib/domain/vocabulary';

/**
 * The install as this tablet knows it: the server's view (SWR, refetched when the live stream reports a tap
 * on this install, so a second tablet shows the same clock; polled every few seconds without a stream) merged
 * with taps still waiting in the on-device outbox.
 */
export function useInstall(id: string, fallbackData: InstallViewResponse, viewer: OutboxUser) {
  // Another tablet's tap on this install arrives on the live stream; without a stream the view polls.
  const refetch = useRef<() => void>(() => undefined);
  const live = useLiveStream(
    (event) => {
      if (event.installId === id) refetch.current();
    },
    () => refetch.current(),
  );
  const { data, mutate } = useSWR<InstallViewResponse>(
    `/api/installs/${id}`,
    (url: string) => fetchJson<InstallViewResponse>(url),
    {
      fallbackData,
      refreshInterval: refreshIntervalFor(live),
      revalidateOnFocus: true,
    },
  );
  useEffect(() => {
    refetch.current = () => void mutate();
  }, [mutate]);
  const view = data ?? fallbackData;
  const [entries, setEntries] = useState<OutboxEntry[]>([]);

  useEffect(() => {
    let alive = true;
    let unsubscribe: (() => void) | undefined;
    void loadOutbox().then(({ listEntries, subscribe }) => {
      if (!alive) return;
      const refresh = () => {
        void listEntries(id).then((list) => alive && setEntries(list));
      };
      refresh();
      unsubscribe = subscribe(() => {
        refresh();
        void mutate();
      });
    });
    return () => {
      alive = false;
      unsubscribe?.();
    };
  }, [id, mutate]);

  const serverIds = useMemo(() => new Set(view.events.map((e) => e.clientEventId)), [view.events]);
  // Taps the server's view does not show yet count as happened, the crew's screen must move on at
  // once: those still queued, and those just sent whose echo has not come back through SWR.
  // Memoised, so the screen's per-second tick neither folds the log again nor re-renders the event log.
  const local = useMemo(
    () => entries.filter((e) => e.status !== 'rejected' && !serverIds.has(e.clientEventId)),
    [entries, serverIds],
  );
  // Taps of someone else on this tablet wait for them to sign in again; they are not "about to sync".
  const isOthers = (e: OutboxEntry) => e.userId !== undefined && e.userId !== viewer.id;
  const queued = entries.filter((e) => e.status === 'pending' && !isOthers(e));
  const waiting = entries.filter((e) => e.status === 'pending' && isOthers(e));
  const rejected = entries.filter((e) => e.status === 'rejected');
  const state = useMemo(() => {
    const fromServer: InstallEventInput[] = view.events.map((e) => ({ ...e }));
    const fromDevice: InstallEventInput[] = local.map((e) => ({
      id: e.clientEventId,
      clientEventId: e.clientEventId,
      type: e.type as InstallEventType,
      deviceTime: e.deviceTime,
      payload: e.payload,
      correctsEventId: e.correctsEventId ?? null,
    }));
    return deriveInstallState([...fromServer, ...fromDevice]);
  }, [view.events, local]);

  // The clock correction can move by a fraction of a second when fresh samples arrive; a tap must
  // still never be stamped before one already recorded, or the log would reorder what was done.
  const latestMs = state.log.reduce((max, e) => Math.max(max, e.deviceTime.getTime()), 0);
  const tap = useCallback(
    async (type: InstallEventType, payload: Record<string, unknown> = {}, correctsEventId?: string) => {
      const deviceTime = new Date(Math.max(serverNow().getTime(), latestMs + 1)).toISOString();
      const { enqueueEvent, flushOutbox } = await loadOutbox();
      await enqueueEvent({
        installId: id,
        clientEventId: crypto.randomUUID(),
        type,
        deviceTime,
        payload,
        correctsEventId,
        userId: viewer.id,
        userName: viewer.name,
      });
      // Sending is best effort: the outbox keeps the tap and the sync loop retries.
      void flushOutbox().then(() => mutate());
    },
    [id, mutate, latestMs, viewer.id, viewer.name],
  );

  return { view, state, local, queued, waiting, rejected, tap };
}
