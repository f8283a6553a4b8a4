import type { InstallEventType } from '@/lib/domain/vocabulary';

// The install's event log as the step machine reads it: stored rows or taps queued on the device
// (whose times are still ISO strings), sorted and with corrections applied.

export type InstallEventInput = {
  id: string;
  clientEventId?: string | null;
  type: InstallEventType;
  deviceTime: Date | string;
  receivedAt?: Date | string | null;
  payload?: Record<string, unknown> | null;
  correctsEventId?: string | null;
};

/** An original event with its corrections applied. */
export type EffectiveEvent = {
  id: string;
  clientEventId: string | null;
  type: InstallEventType;
  deviceTime: Date;
  receivedAt: Date | null;
  payload: Record<string, unknown>;
  /** True when a correction changed its time or payload. */
  corrected: boolean;
};

export const toDate = (value: Date | string) => (value instanceof Date ? value : new Date(value));

const ms = (value: Date | string | null | undefined) =>
  value == null ? Number.POSITIVE_INFINITY : toDate(value).getTime();

/** By device time, then by when the server heard of it (not yet received sorts last). */
export function sortEvents<E extends { deviceTime: Date | string; receivedAt?: Date | string | null }>(
  events: readonly E[],
): E[] {
  return [...events].sort((a, b) => ms(a.deviceTime) - ms(b.deviceTime) || ms(a.receivedAt) - ms(b.receivedAt));
}

/** A correction's payload: `deviceTime` replaces the event's time, `payload` is merged over its payload. */
export function applyCorrection(target: EffectiveEvent, correction: Record<string, unknown>): EffectiveEvent {
  const deviceTime = typeof correction.deviceTime === 'string' ? new Date(correction.deviceTime) : target.deviceTime;
  const changes = isRecord(correction.payload) ? correction.payload : {};
  return { ...target, deviceTime, payload: { ...target.payload, ...changes }, corrected: true };
}

const isRecord = (value: unknown): value is Record<string, unknown> =>
  typeof value === 'object' && value !== null && !Array.isArray(value);
