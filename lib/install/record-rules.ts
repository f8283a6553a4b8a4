import type { InstallStatus } from '@/lib/domain/vocabulary';
import { refusal, type Refusal } from '@/lib/i18n/refusals';

// Rules of the install record that do not depend on the log's order (that is lib/install/state.ts):
// how far a device's clock may be from the server's, which installs are closed, which corrections
// are decisions. Pure, so the server and the tests share them.

/** A tap may be stamped at most this far after the server received it (clock drift of a tablet). */
export const DEVICE_TIME_MAX_AHEAD_MS = 5 * 60_000;
/** …and at most this far before it (a tablet that was offline for days, not a made-up date). */
export const DEVICE_TIME_MAX_BEHIND_MS = 14 * 24 * 3600_000;

/** An approved or abandoned install takes no more taps; only sending it back reopens it. */
export const CLOSED_INSTALL_STATUSES: readonly InstallStatus[] = ['approved', 'abandoned'];

export const isClosedInstall = (status: string) => (CLOSED_INSTALL_STATUSES as readonly string[]).includes(status);

/** Null when `deviceTime` is within the bounds around `receivedAt`, else a message naming the bound. */
export function deviceTimeProblem(deviceTime: Date | string, receivedAt: Date, what = 'deviceTime'): string | null {
  return deviceTimeRefusal(deviceTime, receivedAt, what)?.text ?? null;
}

/** deviceTimeProblem's sentence in English and as a catalogue message (lib/install/refusals.ts). */
export function deviceTimeRefusal(deviceTime: Date | string, receivedAt: Date, what = 'deviceTime'): Refusal | null {
  const ms = new Date(deviceTime).getTime();
  if (!Number.isFinite(ms)) return refusal('timeNotDate', { what });
  if (ms - receivedAt.getTime() > DEVICE_TIME_MAX_AHEAD_MS) return refusal('timeAhead', { what });
  if (receivedAt.getTime() - ms > DEVICE_TIME_MAX_BEHIND_MS) return refusal('timeBehind', { what });
  return null;
}

/** Event types whose content is a decision (go / no-go, sign-off), and the payload keys that carry one. */
const DECISION_TYPES = ['go_decision', 'signed_off'];
const DECISION_KEYS = ['go', 'overrideReason', 'name'];

/** True when a correction of `targetType` changing `changes` would alter a decision. */
export function correctsDecision(targetType: string | undefined, changes: Record<string, unknown>): boolean {
  return (
    (targetType !== undefined && DECISION_TYPES.includes(targetType)) || DECISION_KEYS.some((key) => key in changes)
  );
}
