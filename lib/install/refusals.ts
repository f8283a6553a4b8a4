import { message, type LibMessage } from '@/lib/i18n/message';

// Why the server refuses a tap, as a sentence for the crew: the English the API has always answered (tests and
// desks read it byte for byte) beside the same sentence as a `lib.refusal.*` message, which the tap route writes
// in the signed-in user's language. tests/unit/install/refusals.test.ts holds the English catalogue equal to it.

const ENGLISH = {
  alreadySignedOff: () => 'This install is already signed off.',
  sentBack: () => 'This install was sent back: add notes, corrections or a new inspection, then sign off again.',
  signedOff: () => 'This install is signed off: only a note or a correction can be added now.',
  safetyTwice: () => 'Safety was already acknowledged on this install.',
  dryRunNotStarted: () => 'Start the dry run before recording its end.',
  mixedTwice: () => 'The resin was already mixed on this install; a new mix needs a new install.',
  loadBeforeMix: () => 'Record "resin mixed" before "patch loaded".',
  positionBeforeMix: () => 'Record "resin mixed" before "packer in position".',
  inflateBeforeMix: () => 'Record "resin mixed" before "bladder inflated".',
  inflatedTwice: () => 'The bladder was already inflated on this install.',
  inflatedBeforeMixed: () => 'The bladder cannot be inflated before the resin was mixed: check the time on the device.',
  pressureBeforeInflate: () => 'Record "bladder inflated" before a pressure reading.',
  pressureAfterDeflate: () => 'The bladder is already deflated: a pressure reading no longer applies.',
  deflateBeforeInflate: () => 'Record "bladder inflated" before "bladder deflated".',
  deflatedTwice: () => 'The bladder was already deflated on this install.',
  deflatedBeforeInflated: () => 'The bladder cannot be deflated before it was inflated: check the time on the device.',
  inspectBeforeDeflate: () => 'Record "bladder deflated" before the inspection.',
  signBeforeInspect: () => 'Record the inspection before signing off.',
  correctOriginal: () => 'Correct the original event, not an earlier correction.',
  correctUnknown: () => 'That correction names an event that is not on this install.',
  correctionInflatesEarly: () => 'With that correction the bladder would be inflated before the resin was mixed.',
  correctionDeflatesEarly: () => 'With that correction the bladder would be deflated before it was inflated.',
  closed: (v: { status: string }) => `This install is closed (${v.status}): nothing more can be recorded on it.`,
  otherUser: () => 'This tap was made by another user: it is sent only while they are signed in.',
  foremanSignsOff: () => 'Only the foreman can sign off an install.',
  foremanOverrides: () => 'Only the foreman can override a no-go.',
  foremanCorrectsDecision: () => 'Only the foreman can correct a go / no-go decision or a sign-off.',
  otherCrew: () => 'This install belongs to another crew.',
  timeNotDate: (v: { what: string }) => `${v.what} is not a date`,
  timeAhead: (v: { what: string }) =>
    `${v.what} is more than 5 minutes after the server's time: check the tablet's date and time`,
  timeBehind: (v: { what: string }) =>
    `${v.what} is more than 14 days before the server's time: such a tap can no longer be recorded`,
} satisfies Record<string, (values: never) => string>;

export type RefusalKey = keyof typeof ENGLISH;

/** A refusal in English and as a catalogue message. */
export type Refusal = { text: string; detail: LibMessage };

type ValuesOf<K extends RefusalKey> = Parameters<(typeof ENGLISH)[K]>[0];

export function refusal<K extends RefusalKey>(
  key: K,
  ...values: ValuesOf<K> extends undefined ? [] : [ValuesOf<K>]
): Refusal {
  const english = ENGLISH[key] as (v?: Record<string, string>) => string;
  const given = values[0] as Record<string, string> | undefined;
  return { text: english(given), detail: message(`refusal.${key}`, given) };
}

export const REFUSAL_KEYS = Object.keys(ENGLISH) as RefusalKey[];
