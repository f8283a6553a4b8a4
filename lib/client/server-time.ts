// The tablet's clock corrected by the server's. A tablet left on a wrong time (or a wrong
// zone set as local time) would otherwise count down to the wrong moment; the server's
// `Date` header arrives with every response for free, so each one is a sample.
//
// A `Date` header has whole-second resolution and is truncated, so one sample only says that
// the offset lies in [date − received, date + 1 s − started]. Intersecting the bounds of the
// recent samples narrows it to well under a second; the estimate is the middle of that range.

/** One sample's bounds on (server time − device time), ms. */
interface Sample {
  lo: number;
  hi: number;
  /** Device time the sample was taken, ms. */
  at: number;
}

const MAX_SAMPLES = 12;
// Device clocks drift (tens of ms per hour) and can be reset by hand; old samples stop
// describing the present.
const MAX_SAMPLE_AGE_MS = 30 * 60_000;
// A response slower than this says too little about when the header was written.
const MAX_ROUND_TRIP_MS = 30_000;
const STORAGE_KEY = 'setline.clock-offset';

let samples: Sample[] = [];
let offsetMs: number | null = null;

/**
 * Takes one sample from a response's `Date` header and the device times (Date.now()) the
 * request was sent and the response received. Returns false when the sample was unusable.
 */
export function recordServerDate(
  dateHeader: string | null,
  requestStartedMs: number,
  responseReceivedMs: number,
): boolean {
  if (!dateHeader) return false;
  const serverMs = Date.parse(dateHeader);
  const roundTrip = responseReceivedMs - requestStartedMs;
  if (!Number.isFinite(serverMs) || !Number.isFinite(roundTrip) || roundTrip < 0 || roundTrip > MAX_ROUND_TRIP_MS)
    return false;

  const sample = { lo: serverMs - responseReceivedMs, hi: serverMs + 1000 - requestStartedMs, at: responseReceivedMs };
  samples = [
    ...samples.filter((s) => responseReceivedMs - s.at <= MAX_SAMPLE_AGE_MS && s.at <= responseReceivedMs),
    sample,
  ].slice(-MAX_SAMPLES);
  offsetMs = estimate(samples);
  persist(offsetMs);
  return true;
}

/** Server time − device time, ms; 0 until a sample (or one saved by an earlier visit) is known. */
export function clockOffsetMs(): number {
  if (offsetMs === null) offsetMs = restore() ?? 0;
  return offsetMs;
}

/** The present moment by the server's clock. */
export function serverNow(): Date {
  return new Date(Date.now() + clockOffsetMs());
}

/** Forgets every sample (tests, or a sign-out on a shared tablet). */
export function resetServerClock(): void {
  samples = [];
  offsetMs = null;
  try {
    globalThis.localStorage?.removeItem(STORAGE_KEY);
  } catch {
    // Storage can be disabled; there is then nothing to forget.
  }
}

// Newest first: the newest sample always counts; older ones narrow it while they agree.
// When they disagree the device clock has been moved since, and the older ones are dropped.
function estimate(all: Sample[]): number {
  let lo = -Infinity;
  let hi = Infinity;
  for (let i = all.length - 1; i >= 0; i -= 1) {
    const nextLo = Math.max(lo, all[i].lo);
    const nextHi = Math.min(hi, all[i].hi);
    if (nextLo > nextHi) break;
    lo = nextLo;
    hi = nextHi;
  }
  return Math.round((lo + hi) / 2);
}

// Kept across reloads so a page reopened without signal still counts by the corrected clock.
function persist(value: number): void {
  try {
    globalThis.localStorage?.setItem(STORAGE_KEY, String(value));
  } catch {
    // Private mode or full storage: the in-memory value still serves this page.
  }
}

function restore(): number | null {
  try {
    const text = globalThis.localStorage?.getItem(STORAGE_KEY);
    const value = text == null ? NaN : Number(text);
    return Number.isFinite(value) ? value : null;
  } catch {
    return null;
  }
}
