import { randomUUID } from 'node:crypto';
import type { NewOutboxEvent } from '@/lib/client/outbox';

/** What the fake server does with one request: answer with a status, or drop the connection. */
export type Answer = number | 'network-error' | { status: number; message: string };

export interface SentRequest {
  url: string;
  body: {
    clientEventId: string;
    type: string;
    deviceTime: string;
    payload: Record<string, unknown>;
    correctsEventId?: string;
  };
}

/**
 * A fetch that records every request and answers each by `answer(request, index)`
 * (default 201). Slow answers let tests overlap flushes.
 */
export function fakeServer(answer: (request: SentRequest, index: number) => Answer = () => 201, delayMs = 0) {
  const sent: SentRequest[] = [];
  const fetchImpl = (async (url: string | URL | Request, init?: RequestInit) => {
    const request = { url: String(url), body: JSON.parse(String(init?.body)) } as SentRequest;
    const index = sent.length;
    sent.push(request);
    if (delayMs) await new Promise((resolve) => setTimeout(resolve, delayMs));
    const reply = answer(request, index);
    if (reply === 'network-error') throw new TypeError('Failed to fetch');
    const status = typeof reply === 'number' ? reply : reply.status;
    const message = typeof reply === 'number' ? `status ${reply}` : reply.message;
    const body = status < 300 ? { id: randomUUID() } : { error: { message } };
    return new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
  }) as typeof fetch;
  return { fetchImpl, sent, ids: () => sent.map((r) => r.body.clientEventId) };
}

export const INSTALL_A = '7d3c9a4e-0b1f-4c55-9a0e-1f2b3c4d5e6f';
export const INSTALL_B = '0c8e7f6a-5b4d-4c3b-8a29-1e0f9d8c7b6a';

/** A valid tap of `type` (payload-free types by default) for an install. */
export function tap(installId = INSTALL_A, type = 'note', minute = 0): NewOutboxEvent {
  const payload = type === 'note' ? { text: `note at minute ${minute}` } : {};
  return {
    installId,
    clientEventId: randomUUID(),
    type,
    deviceTime: new Date(Date.UTC(2026, 4, 4, 8, minute)).toISOString(),
    payload,
  };
}
