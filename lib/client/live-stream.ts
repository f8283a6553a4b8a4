'use client';

import { useEffect, useRef, useState } from 'react';

// The browser side of GET /api/live. EventSource reconnects by itself and sends the last `id:` it saw as
// Last-Event-ID, so the server replays what was missed. A browser without EventSource, or a stream refused
// outright (a proxy that will not pass it, a server that cannot listen), leaves `live` false: the screen
// then polls through SWR as before, and the stream is tried again every minute.

/** One tap as the stream sends it (lib/data/live.ts `LiveEvent`). */
export type LiveStreamEvent = {
  seq: string;
  id: string;
  installId: string;
  eventId: string;
  type: string;
  step: string;
  status: string;
  jobId: string;
  deviceTime: string;
  receivedAt: string;
};

export type LiveStreamStatus = 'connecting' | 'live' | 'polling';

/** SWR's refresh interval for data the stream keeps fresh: slow while live, quick while polling. */
export const refreshIntervalFor = (status: LiveStreamStatus) => (status === 'live' ? 60_000 : 5_000);

const RETRY_AFTER_MS = 60_000;

/**
 * Subscribes to the live stream while mounted. `onEvent` gets every tap the caller may see; `onResync` is
 * called when the stream (re)opens or the server says it was too far behind: data read before may be stale.
 */
export function useLiveStream(
  onEvent: (event: LiveStreamEvent) => void,
  onResync?: () => void,
  url = '/api/live',
): LiveStreamStatus {
  const [status, setStatus] = useState<LiveStreamStatus>('connecting');
  const handlers = useRef({ onEvent, onResync });
  useEffect(() => {
    handlers.current = { onEvent, onResync };
  });

  useEffect(() => {
    if (typeof EventSource === 'undefined') {
      const timer = setTimeout(() => setStatus('polling'), 0);
      return () => clearTimeout(timer);
    }
    let source: EventSource | null = null;
    let retry: ReturnType<typeof setTimeout> | undefined;
    let stopped = false;

    const open = () => {
      source = new EventSource(url);
      source.onopen = () => setStatus('live');
      source.onmessage = (message) => {
        const event = parseEvent(message.data);
        if (event) handlers.current.onEvent(event);
      };
      const resync = () => handlers.current.onResync?.();
      source.addEventListener('ready', resync);
      source.addEventListener('reset', resync);
      source.onerror = () => {
        if (!source || source.readyState !== EventSource.CLOSED) {
          // The browser is reconnecting by itself (with Last-Event-ID); poll meanwhile.
          setStatus('connecting');
          return;
        }
        setStatus('polling');
        source = null;
        if (!stopped) retry = setTimeout(open, RETRY_AFTER_MS);
      };
    };
    open();
    return () => {
      stopped = true;
      clearTimeout(retry);
      source?.close();
    };
  }, [url]);

  return status;
}

function parseEvent(data: string): LiveStreamEvent | null {
  try {
    const event = JSON.parse(data) as LiveStreamEvent;
    return typeof event?.id === 'string' && typeof event.seq === 'string' ? event : null;
  } catch {
    return null;
  }
}
