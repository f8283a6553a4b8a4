import { message, type LibMessage, type MessageValue } from '@/lib/i18n/message';

// Why the server refuses a tap or an upload, as a sentence for the crew: the English the API has always answered
// (tests and desks read it byte for byte) beside the same sentence as a `lib.refusal.*` message, which the route
// writes in the signed-in user's language. tests/unit/i18n/refusals.test.ts holds the English catalogue equal to it.

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
  eventIdReused: () => 'That event id was already used for a different event',
  kitUnknown: () => 'That resin kit was not found; choose one from the list.',
  packerUnknown: () => 'That packer was not found; choose one from the list.',
  kitExpired: (v: { lot: string; day: string }) => `Resin kit lot ${v.lot} expired on ${v.day}; choose another kit`,
  makerHoldNeeded: () =>
    "The pipe is outside the resin's rated range: going on needs the hold time from the resin maker's sheet.",
  // Uploads (lib/data/attachments.ts completeUpload): what really arrived is checked against what was declared.
  thisFile: () => 'This file',
  thisImage: () => 'This image',
  fileOfType: (v: { ext: string }) => `a ${v.ext} file`,
  unreadableFile: () => 'not an image or video we can read',
  allowed: (v: { image: string; video: string }) =>
    `JPEG, PNG or WebP images up to ${v.image} MB, MP4, WebM or QuickTime videos up to ${v.video} MB`,
  uploadMissing: () => 'The upload was not found: send the file first, then complete it.',
  uploadClosed: (v: { status: string }) => `This install is closed (${v.status}): no more files can be added to it.`,
  uploadSize: (v: { arrived: string; declared: string }) =>
    `The file that arrived is ${v.arrived}, not the ${v.declared} declared. Nothing was kept; upload it again.`,
  uploadType: (v: { name: string; what: string; allowed: string }) =>
    `${v.name} is ${v.what}, whatever its name says. Send ${v.allowed}. Nothing was kept.`,
  imageTooLarge: (v: { size: string; max: string }) =>
    `This image is ${v.size}; images may be at most ${v.max}. Nothing was kept.`,
  videoTooLarge: (v: { size: string; max: string }) =>
    `This video is ${v.size}; videos may be at most ${v.max}. Nothing was kept.`,
  imageUnreadable: (v: { name: string; format: string }) =>
    `${v.name} could not be read as a ${v.format} image (damaged or cut short). Nothing was kept.`,
} satisfies Record<string, (values: never) => string>;

export type RefusalKey = keyof typeof ENGLISH;

/** A refusal in English and as a catalogue message. */
export type Refusal = { text: string; detail: LibMessage };

/** A value of a refusal: a plain string, or a refusal of its own (a nested sentence: "This file", the allowed types). */
type ValuesOf<K extends RefusalKey> = { [V in keyof Parameters<(typeof ENGLISH)[K]>[0]]: string | Refusal };

export function refusal<K extends RefusalKey>(
  key: K,
  ...values: Parameters<(typeof ENGLISH)[K]>[0] extends undefined ? [] : [ValuesOf<K>]
): Refusal {
  const english = ENGLISH[key] as (v?: Record<string, string>) => string;
  const given = values[0] as Record<string, string | Refusal> | undefined;
  if (!given) return { text: english(), detail: message(`refusal.${key}`) };
  const texts: Record<string, string> = {};
  const details: Record<string, MessageValue> = {};
  for (const [name, value] of Object.entries(given)) {
    texts[name] = typeof value === 'string' ? value : value.text;
    details[name] = typeof value === 'string' ? value : value.detail;
  }
  return { text: english(texts), detail: message(`refusal.${key}`, details) };
}

export const REFUSAL_KEYS = Object.keys(ENGLISH) as RefusalKey[];
