// A sentence that pure code hands to a screen as a catalogue key and its values, so the screen writes it in the
// reader's language (i18n/format-message.ts): quantities stay SI and instants UTC until then, and are written
// with the reader's decimal comma, units and time zone.

/** A quantity inside a message, tagged with what it measures. */
export type MessageQuantity =
  | { temperatureC: number }
  | { minutes: number }
  | { seconds: number }
  | { pressureKpa: number }
  /** A short length (pipe, patch), with the decimals its sentence uses. */
  | { lengthMm: number; decimals?: number }
  | { percent: number }
  | { instant: string }
  | { day: string };

export type MessageValue = string | number | MessageQuantity | LibMessage;

/** A key of the `lib` catalogue namespace ("cure.noDryRun") and its values. */
export type LibMessage = { key: string; values?: Record<string, MessageValue> };

export const message = (key: string, values?: Record<string, MessageValue>): LibMessage =>
  values ? { key, values } : { key };

/** An instant as messages carry it: UTC ISO without milliseconds ("2026-12-01T14:05:00Z"). */
export const instant = (at: Date): { instant: string } => ({ instant: at.toISOString().replace('.000Z', 'Z') });
