import type { InstallEventType } from '@/lib/domain/vocabulary';
import { formatDuration, formatLength, formatPressure, formatTemperature, type UnitSystem } from '@/lib/units';

// What an install event recorded, in words and the company's units, for the review page and the
// repair report. Pure: names of kits and packers come in through `names`.

export type EventTextContext = {
  unitSystem: UnitSystem;
  /** "Lot A-17 (expires 2027-03-31)" for a kit id, "10–12 in packer" for a packer id. */
  kitName?: (id: string) => string | undefined;
  packerName?: (id: string) => string | undefined;
  /** An instant as the office reads it (company zone). */
  time?: (at: Date) => string;
};

/** The values of one event's payload as short phrases; empty when the event carries none. */
export function eventDetails(
  type: InstallEventType,
  payload: Record<string, unknown> | null | undefined,
  ctx: EventTextContext,
): string[] {
  const p = payload ?? {};
  const u = ctx.unitSystem;
  const out: string[] = [];
  const num = (key: string) => (typeof p[key] === 'number' && Number.isFinite(p[key]) ? (p[key] as number) : undefined);
  const text = (key: string) =>
    typeof p[key] === 'string' && (p[key] as string).trim() ? (p[key] as string).trim() : undefined;
  if (num('mixTempC') !== undefined) out.push(`mix ${formatTemperature(num('mixTempC')!, u)}`);
  if (num('pipeTempC') !== undefined) out.push(`pipe ${formatTemperature(num('pipeTempC')!, u)}`);
  if (text('resinKitId')) out.push(`kit ${ctx.kitName?.(text('resinKitId')!) ?? 'unknown'}`);
  if (text('packerId')) out.push(`packer ${ctx.packerName?.(text('packerId')!) ?? 'unknown'}`);
  if (num('patchLengthMm') !== undefined) out.push(`patch ${formatLength(num('patchLengthMm')!, u)}`);
  if (num('seconds') !== undefined) out.push(`took ${formatDuration(num('seconds')!)}`);
  if (num('pressureKpa') !== undefined) out.push(formatPressure(num('pressureKpa')!, u));
  if (p.confirmedOutOfRange === true) out.push('confirmed outside the packer’s rating');
  if (type === 'go_decision' && typeof p.go === 'boolean') out.push(p.go ? 'GO' : 'NO-GO');
  if (type === 'checks_done' && Array.isArray(p.items)) {
    const items = p.items as { ok?: unknown }[];
    out.push(`${items.filter((i) => i?.ok === true).length} of ${items.length} checks ok`);
  }
  if (text('result')) out.push(text('result') === 'pass' ? 'pass' : 'FAIL');
  if (type === 'signed_off' && text('name')) out.push(`by ${text('name')}`);
  for (const key of ['overrideReason', 'reason', 'notes', 'text'] as const) {
    if (type !== 'correction' && text(key)) out.push(`“${text(key)}”`);
  }
  return out;
}

/** A correction in words: what it changed on its event, and why. */
export function correctionDetails(
  payload: Record<string, unknown> | null | undefined,
  target: { type: InstallEventType; deviceTime: Date | string; payload?: Record<string, unknown> | null } | null,
  ctx: EventTextContext,
): string[] {
  const p = payload ?? {};
  const time = ctx.time ?? ((at: Date) => at.toISOString());
  const out: string[] = [];
  if (typeof p.deviceTime === 'string' && target)
    out.push(`time ${time(new Date(target.deviceTime))} → ${time(new Date(p.deviceTime))}`);
  if (typeof p.payload === 'object' && p.payload !== null && target) {
    const changes = p.payload as Record<string, unknown>;
    const before = eventDetails(target.type, pick(target.payload ?? {}, Object.keys(changes)), ctx).join(', ');
    const after = eventDetails(target.type, changes, ctx).join(', ');
    if (after) out.push(`${before || '—'} → ${after}`);
  }
  if (typeof p.reason === 'string') out.push(`why: “${p.reason}”`);
  return out;
}

const pick = (from: Record<string, unknown>, keys: string[]) =>
  Object.fromEntries(keys.filter((k) => k in from).map((k) => [k, from[k]]));
