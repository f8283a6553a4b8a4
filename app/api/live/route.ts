import { requireUser } from '@/lib/auth/session';
import { getSessionClaims } from '@/lib/auth/claims';
import { handle, parseOrThrow, searchParamsOf } from '@/lib/server/http';
import { liveStreamResponse } from '@/lib/live/stream';
import { liveQuerySchema, liveSeqSchema } from '@/lib/validation/live';

export const dynamic = 'force-dynamic';

/**
 * The caller's live stream of taps (server-sent events): their company, and for field users their crews'
 * installs only. Resumes after Last-Event-ID (header, or `?lastEventId=`); `?once=1` answers what is waiting and ends.
 */
export const GET = handle(async (request: Request) => {
  const user = await requireUser();
  const query = parseOrThrow(liveQuerySchema, searchParamsOf(request));
  const header = request.headers.get('last-event-id');
  const after = header === null || header === '' ? (query.lastEventId ?? null) : parseOrThrow(liveSeqSchema, header);
  return liveStreamResponse(user, {
    after,
    once: query.once !== undefined,
    signal: request.signal,
    claims: await getSessionClaims(),
  });
});
