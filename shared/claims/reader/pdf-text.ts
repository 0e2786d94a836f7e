/**
 * Text as a PDF or a scan gives it when copied (the claim reader, shared/claims/reader.ts, before pass 1):
 * words broken at the end of a line ("coeffi-\ncient", "Specific im-\npulse"), sentences wrapped at the
 * column's edge ("with outdoor air at 2 °C\nand flow water at 45 °C") and ligature characters ("efﬁciency").
 * The text is read as the writer wrote it — the broken word joined, a wrap read as a space, a ligature as
 * its letters — and every offset maps back to the pasted text, so each figure still points at its words.
 */

/** Ligatures a PDF's fonts put in place of letter pairs (Unicode's Alphabetic Presentation Forms). */
const LIGATURES: Record<string, string> = { 'ﬀ': 'ff', 'ﬁ': 'fi', 'ﬂ': 'fl', 'ﬃ': 'ffi', 'ﬄ': 'ffl', 'ﬅ': 'st', 'ﬆ': 'st' };

/**
 * Second parts of words the trade writes with a hyphen ("air-source", "ground-loop", "wall-plug"): a
 * hyphen at a line's end before one of these is the word's own and stays; before any other lower-case
 * fragment it is the line's, and the word is joined ("effi-\nciency" → "efficiency").
 */
const KEEPS_HYPHEN = new Set([
  'source', 'sources', 'side', 'sides', 'pump', 'pumps', 'water', 'air', 'to', 'fired', 'powered', 'driven', 'free', 'based',
  'type', 'like', 'scale', 'level', 'term', 'state', 'phase', 'cell', 'cells', 'loop', 'loops', 'point', 'plug', 'hour', 'hours',
  'year', 'years', 'day', 'days', 'time', 'run', 'load', 'mode', 'cooled', 'heated', 'mounted', 'grade', 'rated', 'wound',
  'stage', 'speed', 'sun', 'wide', 'made', 'off', 'on', 'up', 'in', 'out', 'down', 'back', 'over', 'end', 'ends', 'and', 'or',
  'the', 'of', 'efficiency', 'efficient', 'energy', 'power', 'heat', 'temperature', 'pressure', 'current', 'voltage', 'hall',
  'effect', 'junction', 'wave', 'band', 'gap', 'connected', 'tied', 'battery', 'fuel', 'gas', 'oil', 'steam', 'cycle',
]);

export interface Unwrapped {
  text: string;
  /** For each offset of `text` (and one past its end), the offset in the pasted text it came from. */
  toPasted: number[];
}

/** A line's end that breaks a word ("effi-" then "ciency" on the next line). */
const BROKEN_WORD_RE = /(\p{Ll})-[^\S\n]*\n[^\S\n]*(?=(\p{Ll}+))/gu;
/** A line's end inside a sentence: the next line goes on in lower case from its first column, after no full stop or colon. */
const SOFT_WRAP_RE = /([^\s.:;!?|])[^\S\n]*\n(?=\p{Ll})/gu;

/** The pasted text as written, with the offsets back; null when it has nothing of the kind. */
export function unwrapPdfText(pasted: string): Unwrapped | null {
  const edits: { at: number; length: number; insert: string }[] = [];
  for (const m of pasted.matchAll(BROKEN_WORD_RE)) {
    const hyphen = m.index! + m[1].length;
    const keep = KEEPS_HYPHEN.has(m[2]);
    edits.push({ at: keep ? hyphen + 1 : hyphen, length: m[0].length - m[1].length - (keep ? 1 : 0), insert: '' });
  }
  for (const m of pasted.matchAll(SOFT_WRAP_RE)) {
    const nl = m.index! + m[0].length - 1;
    // (Not a line that a broken word already joins, nor one whose next line is a list's or a table's row.)
    if (edits.some((e) => e.at <= nl && nl < e.at + e.length)) continue;
    // (A short line of its own — a heading, a label — is no wrap: "Conditions\nindoor test cell".)
    const lineStart = pasted.lastIndexOf('\n', nl - 1) + 1;
    if (nl - lineStart < 40) continue;
    // (Nor a table's or a sheet's row: leader dots, pipes, tabs or a wide gap between cells.)
    if (/\.{3,}|…|\||\t|[^\S\n]{3,}/u.test(pasted.slice(lineStart, nl))) continue;
    edits.push({ at: nl, length: 1, insert: ' ' });
  }
  for (let i = 0; i < pasted.length; i++) if (LIGATURES[pasted[i]]) edits.push({ at: i, length: 1, insert: LIGATURES[pasted[i]] });
  if (edits.length === 0) return null;
  edits.sort((a, b) => a.at - b.at);
  let text = '';
  const toPasted: number[] = [];
  let i = 0;
  for (const e of edits) {
    if (e.at < i) continue;
    for (; i < e.at; i++) {
      text += pasted[i];
      toPasted.push(i);
    }
    for (const ch of e.insert) {
      text += ch;
      toPasted.push(e.at);
    }
    i = e.at + e.length;
  }
  for (; i < pasted.length; i++) {
    text += pasted[i];
    toPasted.push(i);
  }
  toPasted.push(pasted.length);
  return { text, toPasted };
}
