/**
 * Text damaged on its way to the reader (the claim reader, shared/claims/reader.ts, before pass 1):
 * characters of UTF-8 read as Windows-1252 ("Â°C" for "°C", "â€“" for "–", "ÂµN" for "µN"), a symbol
 * a copy lost to a question mark ("25 ?C"), and letters typed or scanned in place of digits inside a
 * number ("2O W", "14O %", "l,35 kW", "O.2 A"). The text is read as the writer meant it, and every
 * offset maps back to the pasted text (as for a PDF's text, reader/pdf-text.ts).
 */
import { applyEdits, type TextEdit, type Unwrapped } from './pdf-text';

/**
 * The characters Windows-1252 puts at bytes 0x80–0x9F (the WHATWG Encoding Standard's index
 * windows-1252); its other bytes from 0xA0 are the Latin-1 characters of the same code.
 */
const CP1252_HIGH = '€\u0081‚ƒ„…†‡ˆ‰Š‹Œ\u008DŽ\u008F\u0090‘’“”•–—˜™š›œ\u009DžŸ';
const cp1252Byte = (ch: string): number | null => {
  const code = ch.codePointAt(0)!;
  const high = CP1252_HIGH.indexOf(ch);
  if (high >= 0) return 0x80 + high;
  return code >= 0xa0 && code <= 0xff ? code : null;
};
/** A lead byte of a UTF-8 sequence of two, three or four bytes, seen as its Windows-1252 character (Â … ô). */
const MOJIBAKE_RE = /[\u00C2-\u00F4][€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ\u0081\u008D\u008F\u0090\u009D\u00A0-\u00BF]{1,3}/gu;
/**
 * The character a UTF-8 sequence of two to four bytes encodes (RFC 3629, §3: lead and continuation bytes,
 * no overlong form, no surrogate, nothing past U+10FFFF), or null. (Written out: TextDecoder is not in
 * every JavaScript engine the app runs on.)
 */
function decodeUtf8(bytes: number[]): string | null {
  const [b0, ...rest] = bytes;
  if (rest.some((b) => b < 0x80 || b > 0xbf)) return null;
  const tail = rest.reduce((cp, b) => (cp << 6) | (b & 0x3f), 0);
  let cp: number;
  if (bytes.length === 2 && b0 >= 0xc2 && b0 <= 0xdf) cp = ((b0 & 0x1f) << 6) | tail;
  else if (bytes.length === 3 && b0 >= 0xe0 && b0 <= 0xef) cp = ((b0 & 0x0f) << 12) | tail;
  else if (bytes.length === 4 && b0 >= 0xf0 && b0 <= 0xf4) cp = ((b0 & 0x07) << 18) | tail;
  else return null;
  const least = bytes.length === 2 ? 0x80 : bytes.length === 3 ? 0x800 : 0x10000;
  if (cp < least || cp > 0x10ffff || (cp >= 0xd800 && cp <= 0xdfff)) return null;
  return String.fromCodePoint(cp);
}

/** "Â°" → "°", "â€“" → "–": each run that decodes as one UTF-8 character when read back as Windows-1252 bytes. */
function mojibakeEdits(pasted: string): TextEdit[] {
  const edits: TextEdit[] = [];
  for (const m of pasted.matchAll(MOJIBAKE_RE)) {
    const bytes = [...m[0]].map(cp1252Byte);
    const lead = bytes[0]!;
    const need = lead >= 0xf0 ? 4 : lead >= 0xe0 ? 3 : 2;
    if (bytes.length < need || bytes.slice(1, need).some((b) => b === null || b < 0x80 || b > 0xbf)) continue;
    const decoded = decodeUtf8(bytes.slice(0, need) as number[]);
    if (decoded === null) continue;
    // ("Â " — a no-break space come through as "Â" and a space — reads as a space.)
    edits.push({ at: m.index!, length: need, insert: decoded === '\u00A0' ? ' ' : decoded });
  }
  return edits;
}

/** A question mark left where a copy lost a degree sign or a micro sign: "2O?C", "25 ?C", "12 ?N", "3 ?W". */
const LOST_SYMBOL_RE = /(?<=[\dO][^\S\n]?)\?(?=([CF]|[NWAVgms]|m[^\S\n]?(?:\/|W|N))(?![\p{L}\p{N}]))/gu;

/**
 * A letter in place of a digit inside a number: "O" (or "o" between digits) for 0 and "l" for 1 — "2O",
 * "4O0", "7,8OO", "l30", "l,35", "3l0", "O.2", "9.8E+O2". Only where the run of digits, separators and those
 * letters holds a real digit and reads as a number once they are digits; a leading "O" only before a point
 * or in an exponent (never "O2"), a trailing "l" never (a litre: "2l"), so words ("lot", "Oslo"), formulas
 * ("CO2", "H2O") and units are left alone.
 */
const NUMBER_RUN_RE = /(?<![\p{L}\p{N}_])[\dOol][\dOol.,]*(?![\p{N}])/gu;
const NUMBER_SHAPE_RE = /^(?:\d{1,3}(?:,\d{3})+|\d+)(?:[.,]\d+)?$/u;
function letterDigitEdits(pasted: string): TextEdit[] {
  const edits: TextEdit[] = [];
  for (const m of pasted.matchAll(NUMBER_RUN_RE)) {
    const body = m[0].replace(/l+$/u, '').replace(/[.,]+$/u, '');
    if (!/\d/u.test(body) || !/[Ool]/u.test(body)) continue;
    const exponent = /\d[eE][+\-−]?$/u.test(pasted.slice(Math.max(0, m.index! - 4), m.index!));
    if (body[0] === 'O' && !/^O[.,]\d/u.test(body) && !exponent) continue;
    if ([...body].some((ch, i) => ch === 'o' && !(/\d/u.test(body[i - 1] ?? '') && /[\dO]/u.test(body[i + 1] ?? '')))) continue;
    if (!NUMBER_SHAPE_RE.test(body.replace(/[Oo]/gu, '0').replace(/l/gu, '1'))) continue;
    for (let i = 0; i < body.length; i++) if (/[Ool]/u.test(body[i])) edits.push({ at: m.index! + i, length: 1, insert: body[i] === 'l' ? '1' : '0' });
  }
  return edits;
}

/** Units run together in a sheet's cell: "48V25A", "12v5a" — a space between the first unit and the next number. */
const RUN_TOGETHER_RE = /(?<=\d(?:[.,]\d+)?)(?:kW|kw|KW|V|v|A|a|W|w|Hz|hz)(?=\d+(?:[.,]\d+)?(?:kW|kw|KW|V|v|A|a|W|w|Hz|hz|Ah|ah|mA)(?!\p{L}))/gu;

/**
 * Words typed in capitals ("THE CRAFT REACHED 900 MILLION MPH ON ITS THIRD TEST"): in a run of five capital
 * words or more with no lower-case letter between, the longer words (four letters or more) are read in
 * lower case, so numbers and units in words are read; the short ones, unit symbols among them ("MPH",
 * "KW"), are left as typed, and so are headings and acronyms of a few words.
 */
function shoutingEdits(pasted: string): TextEdit[] {
  const edits: TextEdit[] = [];
  let run: RegExpMatchArray[] = [];
  const close = () => {
    if (run.length >= 5) for (const m of run) if (m[0].length >= 4) edits.push({ at: m.index!, length: m[0].length, insert: m[0].toLowerCase() });
    run = [];
  };
  let last = 0;
  for (const m of pasted.matchAll(/(?<!\p{L})\p{Lu}{2,}(?!\p{L})/gu)) {
    if (/\p{Ll}|\n/u.test(pasted.slice(last, m.index))) close();
    run.push(m);
    last = m.index! + m[0].length;
  }
  close();
  return edits;
}

/**
 * A figure the writer puts right at once: "a COP of 45 .. sorry 4.5", "3 kW, I mean 3.5 kW", "12 (typo) 1.2":
 * the slip and the words owning it are blanked (to the same length), so the figure read is the one meant.
 * (Only where the two carry the same unit, or neither has one.)
 */
const SLIP_RE =
  /(?<![\p{L}\p{N}.,])\d+(?:[.,]\d+)*(?:([^\S\n]?(?:[\p{L}µ°%][\p{L}/²³]{0,5}))(?!\p{L}))?[^\S\n]*(?:\.{2,}|…|[,;:(—–-])?[^\S\n]*(?:sorry|oops|I mean|I meant|make that|or rather|correction|typo|scratch that|no wait|erm?)(?!\p{L})[,:;!.)]*[^\S\n]*(?=\d)/giu;
function slipEdits(pasted: string): TextEdit[] {
  const edits: TextEdit[] = [];
  for (const m of pasted.matchAll(SLIP_RE)) {
    // (A slip said with its unit is put right with the same unit: "12 years, sorry 2 of them" is no correction.)
    const unit = m[1]?.trim();
    if (unit && !pasted.slice(m.index! + m[0].length).replace(/^\d+(?:[.,]\d+)*[^\S\n]?/u, '').startsWith(unit)) continue;
    edits.push({ at: m.index!, length: m[0].length, insert: ' '.repeat(m[0].length) });
  }
  return edits;
}

/** The text as the writer meant it, with the offsets back; null when nothing in it was damaged so. */
export function repairTyping(pasted: string): Unwrapped | null {
  const edits = [...mojibakeEdits(pasted), ...shoutingEdits(pasted), ...slipEdits(pasted)];
  for (const m of pasted.matchAll(RUN_TOGETHER_RE)) edits.push({ at: m.index! + m[0].length, length: 0, insert: ' ' });
  for (const m of pasted.matchAll(LOST_SYMBOL_RE)) edits.push({ at: m.index!, length: 1, insert: /^[CF]/u.test(m[1]) ? '°' : 'µ' });
  edits.push(...letterDigitEdits(pasted));
  return applyEdits(pasted, edits);
}
