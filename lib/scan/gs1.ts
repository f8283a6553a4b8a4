// GS1 element strings read from a barcode (GS1-128, GS1 DataMatrix, GS1 QR) or typed in their human-readable
// form "(01)…(17)…(10)…". Pure: no I/O. Rules from the GS1 General Specifications (from memory, release 24):
// §3.2 (AI table), §5.10 / §7.8.5 (predefined-length AIs need no FNC1 separator; every other element string is
// ended by FNC1, sent as GS, ASCII 29), §3.4.6 (AI 17: YYMMDD, DD = 00 means the last day of the month),
// §7.12 (century of a two-digit year), §7.9.1 (mod-10 check digit of GTIN).

export type Gs1Element = { ai: string; value: string; known: boolean };

export type Gs1Label = {
  elements: Gs1Element[];
  gtin?: string;
  /** AI 10, batch or lot number. */
  lot?: string;
  /** AI 17, expiry as YYYY-MM-DD (DD = 00 resolved to the month's last day). */
  expiresOn?: string;
  /** AI 11, production date as YYYY-MM-DD, or YYYY-MM when the label gives only the month (DD = 00). */
  producedOn?: string;
  /** AI 21, serial number. */
  serial?: string;
};

export class Gs1Error extends Error {}

const GS = '\u001d';

type Spec = { fixed: number } | { max: number };

// The AIs a resin kit's label may carry, with their data lengths (§3.2). Others are read by the length rules below.
const AIS: Record<string, Spec> = {
  '00': { fixed: 18 },
  '01': { fixed: 14 },
  '02': { fixed: 14 },
  '10': { max: 20 },
  '11': { fixed: 6 },
  '12': { fixed: 6 },
  '13': { fixed: 6 },
  '15': { fixed: 6 },
  '16': { fixed: 6 },
  '17': { fixed: 6 },
  '20': { fixed: 2 },
  '21': { max: 20 },
  '22': { max: 20 },
  '30': { max: 8 },
  '37': { max: 8 },
  '240': { max: 30 },
  '241': { max: 30 },
  '250': { max: 30 },
  '400': { max: 30 },
  '422': { fixed: 3 },
  '7003': { fixed: 10 },
};

// Element strings of these two-digit prefixes have a predefined total length and are never followed by FNC1 (§7.8.5).
const PREDEFINED_TOTAL: Record<string, number> = {
  '00': 20,
  '01': 16,
  '02': 16,
  '03': 16,
  '04': 18,
  '11': 8,
  '12': 8,
  '13': 8,
  '14': 8,
  '15': 8,
  '16': 8,
  '17': 8,
  '18': 8,
  '19': 8,
  '20': 4,
  '31': 10,
  '32': 10,
  '33': 10,
  '34': 10,
  '35': 10,
  '36': 10,
  '41': 16,
};

/** How many digits the AI starting `text` has, from its first two digits (§3.2). */
function aiLength(text: string): number {
  const two = Number(text.slice(0, 2));
  if (two <= 22 || two === 30 || two === 37 || two >= 90) return 2;
  if ((two >= 31 && two <= 36) || two === 39 || two === 43 || two === 70 || two === 72 || two >= 80) return 4;
  return 3;
}

/**
 * Parses what a scanner returned or what a person typed. Accepts a leading symbology identifier (]C1, ]d2, ]Q3,
 * ]e0), GS as FNC1, and the parenthesised human-readable form. Throws Gs1Error when the text is not GS1 data.
 */
export function parseGs1(input: string, today = new Date()): Gs1Label {
  const text = input.trim();
  const elements = text.startsWith('(') ? parseHumanReadable(text) : parseRaw(text);
  if (elements.length === 0) throw new Gs1Error('No GS1 data on this label.');
  const label: Gs1Label = { elements };
  for (const { ai, value } of elements) {
    if (ai === '01') {
      if (!validCheckDigit(value)) throw new Gs1Error(`GTIN ${value} has a wrong check digit.`);
      label.gtin = value;
    } else if (ai === '10') label.lot = value;
    else if (ai === '17') label.expiresOn = gs1Date(value, today, true);
    else if (ai === '11') label.producedOn = gs1Date(value, today, false);
    else if (ai === '21') label.serial = value;
  }
  return label;
}

/** Whether a scanned text looks like GS1 data at all (so a plain lot barcode can be used as typed). */
export function looksLikeGs1(input: string): boolean {
  const text = input.trim();
  return /^\][A-Za-z]\d/.test(text) || /^\(\d{2,4}\)/.test(text) || text.includes(GS) || /^(01|02|00)\d{14}/.test(text);
}

function parseHumanReadable(text: string): Gs1Element[] {
  const elements: Gs1Element[] = [];
  const pattern = /\((\d{2,4})\)([^(]*)/g;
  let consumed = 0;
  for (const match of text.matchAll(pattern)) {
    if (match.index !== consumed) throw new Gs1Error('Unexpected text between the parenthesised AIs.');
    consumed = match.index + match[0].length;
    elements.push(element(match[1], match[2].trim()));
  }
  if (consumed !== text.length) throw new Gs1Error('Unexpected text after the last AI.');
  return elements;
}

function parseRaw(input: string): Gs1Element[] {
  let text = input.replace(/^\][A-Za-z][0-9]/, '');
  // Some scanners send FNC1 as the literal "<GS>" or the caret notation "^]" — accept both.
  text = text.replace(/<GS>|\^\]/g, GS);
  if (text.startsWith(GS)) text = text.slice(1);
  const elements: Gs1Element[] = [];
  let at = 0;
  while (at < text.length) {
    if (text[at] === GS) {
      at += 1;
      continue;
    }
    const rest = text.slice(at);
    if (!/^\d{2}/.test(rest)) throw new Gs1Error(`Expected an application identifier at position ${at + 1}.`);
    const aiLen = aiLength(rest);
    const ai = rest.slice(0, aiLen);
    if (!/^\d+$/.test(ai) || ai.length !== aiLen)
      throw new Gs1Error(`Incomplete application identifier at position ${at + 1}.`);
    const total = PREDEFINED_TOTAL[ai.slice(0, 2)];
    let value: string;
    if (total !== undefined) {
      value = rest.slice(aiLen, total);
      if (value.length !== total - aiLen) throw new Gs1Error(`AI (${ai}) needs ${total - aiLen} characters.`);
      at += total;
    } else {
      const end = rest.indexOf(GS, aiLen);
      value = end === -1 ? rest.slice(aiLen) : rest.slice(aiLen, end);
      at += end === -1 ? rest.length : end + 1;
    }
    elements.push(element(ai, value));
  }
  return elements;
}

function element(ai: string, value: string): Gs1Element {
  const spec = AIS[ai];
  if (value.length === 0) throw new Gs1Error(`AI (${ai}) has no data.`);
  if (spec && 'fixed' in spec && value.length !== spec.fixed)
    throw new Gs1Error(`AI (${ai}) needs ${spec.fixed} characters.`);
  if (spec && 'max' in spec && value.length > spec.max)
    throw new Gs1Error(`AI (${ai}) takes at most ${spec.max} characters.`);
  // GS1 AI encodable character set 82 (§7.11): printable ASCII without space, ", #, $, @, [, \, ], ^, `, {, |, }, ~.
  if (!/^[!"%-?A-Z_a-z]+$/.test(value)) throw new Gs1Error(`AI (${ai}) holds characters GS1 does not allow.`);
  return { ai, value, known: Boolean(spec) };
}

/**
 * YYMMDD → YYYY-MM-DD; century by §7.12. DD = 00 is the month's last day where `dayZeroIsEnd` (AI 17, 15, 16),
 * else the day is unknown and YYYY-MM is returned (AI 11).
 */
export function gs1Date(yymmdd: string, today = new Date(), dayZeroIsEnd = true): string {
  if (!/^\d{6}$/.test(yymmdd)) throw new Gs1Error(`Date ${yymmdd} is not YYMMDD.`);
  const yy = Number(yymmdd.slice(0, 2));
  const mm = Number(yymmdd.slice(2, 4));
  let dd = Number(yymmdd.slice(4, 6));
  const current = today.getUTCFullYear();
  const diff = yy - (current % 100);
  let century = Math.floor(current / 100);
  if (diff >= 51) century -= 1;
  else if (diff <= -50) century += 1;
  const year = century * 100 + yy;
  if (mm < 1 || mm > 12) throw new Gs1Error(`Date ${yymmdd} has no month ${mm}.`);
  const lastDay = new Date(Date.UTC(year, mm, 0)).getUTCDate();
  if (dd === 0) {
    if (!dayZeroIsEnd) return `${year}-${pad(mm)}`;
    dd = lastDay;
  }
  if (dd > lastDay) throw new Gs1Error(`Date ${yymmdd} has no day ${dd}.`);
  return `${year}-${pad(mm)}-${pad(dd)}`;
}

/** GS1 mod-10 check digit (§7.9.1): weights 3 and 1 from the right, excluding the check digit. */
export function validCheckDigit(digits: string): boolean {
  if (!/^\d{8,18}$/.test(digits)) return false;
  const body = digits.slice(0, -1);
  let sum = 0;
  for (let i = 0; i < body.length; i += 1) sum += Number(body[body.length - 1 - i]) * (i % 2 === 0 ? 3 : 1);
  return (10 - (sum % 10)) % 10 === Number(digits.at(-1));
}

const pad = (n: number) => String(n).padStart(2, '0');
