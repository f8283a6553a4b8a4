import type { FlagSeverity, QualityFlag } from '@/lib/cure';
import { formatInZone } from '@/lib/time/dates';

// How the office weighs an install's quality flags, and how their sentences read on the desk.

const RANK: Record<FlagSeverity, number> = { critical: 2, warning: 1 };

/** 2 when any flag is critical, 1 for warnings only, 0 for a clean install. */
export function worstRank(flags: readonly Pick<QualityFlag, 'severity'>[]): number {
  return flags.reduce((worst, flag) => Math.max(worst, RANK[flag.severity] ?? 0), 0);
}

/** The worst severity of the flags, or null when there are none. */
export function worstSeverity(flags: readonly Pick<QualityFlag, 'severity'>[]): FlagSeverity | null {
  const rank = worstRank(flags);
  return rank === 2 ? 'critical' : rank === 1 ? 'warning' : null;
}

// lib/cure writes instants in flag sentences as UTC ISO ("2026-12-01T14:05:00Z").
const ISO_INSTANT = /\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(?::\d{2}(?:\.\d+)?)?Z/g;

/** A flag sentence with its UTC instants rewritten by `format` (e.g. into the company's zone). */
export function localiseSentence(sentence: string, format: (at: Date) => string): string {
  return sentence.replace(ISO_INSTANT, (iso) => format(new Date(iso)));
}

/** Short names of the flags for badges; the full sentence goes beside them. */
export const FLAG_LABELS: Record<QualityFlag['kind'], string> = {
  'late-inflate': 'Late inflate',
  'early-deflate': 'Early deflate',
  'cold-cure': 'Cold cure',
  'hot-cure': 'Hot cure',
  'no-dry-run': 'No dry run',
  'slow-dry-run': 'Slow dry run',
  'pressure-out-of-range': 'Pressure outside rating',
  'expired-resin': 'Expired resin',
};

/** Flag sentences with their instants in the company's zone, as the office reads them. */
export function localisedFlags(flags: QualityFlag[], timeZone: string): QualityFlag[] {
  return flags.map((flag) => ({
    ...flag,
    message: localiseSentence(flag.message, (at) => formatInZone(at, timeZone)),
  }));
}
