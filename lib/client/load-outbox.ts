// The outbox (Dexie and the check of a tap before it is stored) ships with the install screen itself, not as a
// chunk loaded after the first paint: a tablet that loses its signal before such a chunk arrived (no service
// worker yet, or one that did not keep it) could not queue the crew's tap at all. Callers keep the promise form.
import * as outbox from './outbox';

type OutboxModule = typeof outbox;

export function loadOutbox(): Promise<OutboxModule> {
  return Promise.resolve(outbox);
}
