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
  const edits: TextEdit[] = [];
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
  return applyEdits(pasted, edits);
}

/** An edit of the pasted text: `length` characters at `at` replaced by `insert`. */
export interface TextEdit {
  at: number;
  length: number;
  insert: string;
}

/** The pasted text with its edits made (overlapping ones after the first dropped), and the offsets back; null for no edit. */
export function applyEdits(pasted: string, edits: TextEdit[]): Unwrapped | null {
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

/** A table's cell separator when set as text: a tab, or two spaces or more. */
const CELL_GAP_RE = /\t+|[^\S\n\t]{2,}/gu;
/** A cell that starts with a digit (no header's). */
const DIGIT_CELL_RE = /^[-−+~≈]?\d/u;
/** A cell that is a value: a number first, with or without its unit ("1,250 kg", "0.60", "−7 °C", "two kilowatts"). */
const VALUE_CELL_RE =
  /^(?:[-−+~≈]?\d|(?:zero|one|two|three|four|five|six|seven|eight|nine|ten|eleven|twelve|thirteen|fourteen|fifteen|sixteen|seventeen|eighteen|nineteen|twenty|thirty|forty|fifty|sixty|seventy|eighty|ninety|hundred|thousand)(?![\p{L}]))/iu;
/** A header cell's unit in brackets: "ΔT (K)", "Qc [W]", "Isp (s)". */
const HEADER_UNIT_RE = /^(.*?\S)[^\S\n]*[([]([^()[\]\d]{1,8})[)\]]$/u;
/** A header cell's unit as its last word, after a space: "T_out °C", "Eff. %", "Heat kWh". */
const HEADER_TRAILING_UNIT_RE = /^(.*?\p{L}.*?)[^\S\n]+(\S{1,6})$/u;
/** Units a header may give its column (a bracket in a header is often a note: "Isp (vac)", "Δv (claimed)"). */
const HEADER_UNITS = new Set([
  'K', '°C', '°F', 'W', 'kW', 'MW', 'mW', 'µW', 'J', 'kJ', 'MJ', 'GJ', 'Wh', 'kWh', 'MWh', 'N', 'mN', 'µN', 'uN', 'kN', 'kg', 'g', 't', 's', 'h', 'min', 'A', 'mA', 'V', 'kV', 'mV',
  'm/s', 'km/s', '%', 'hp', 'lbf', 'lb', 'BTU/h', 'Btu/h', 'BTU', 'Btu', 'psi', 'bar',
]);
/** A header cell that names a unit column: such tables are read by the sheet reader's unit joining. */
const UNIT_COLUMN_RE = /^(?:units?|unit of measure|dimension|UoM)$/iu;
/** A rule under a header: "---|:--:|---", "+-----+------+". */
const RULE_LINE_RE = /^[^\S\n]*[|+]?(?:[^\S\n]*:?-{2,}:?[^\S\n]*[|+]?)+[^\S\n]*$/u;

interface Cell {
  start: number;
  end: number;
  text: string;
}

/** How a line's cells are set apart: pipes, semicolons (with decimal commas), or tabs and wide spaces. */
type Separator = '|' | ';' | ',' | 'gap';

function separatorOf(line: string): Separator {
  if (line.includes('|')) return '|';
  if (!line.includes('\t') && (line.match(/;/g) ?? []).length >= 2) return ';';
  // (Commas with no space after them, as a spreadsheet writes them: "Run,Input (W),Thrust (N)".)
  if (!line.includes('\t') && (line.match(/,(?=\S)/g) ?? []).length >= 2 && !/,[^\S\n]/u.test(line)) return ',';
  return 'gap';
}

function cellsOf(line: string, offset: number, sep: Separator = 'gap'): Cell[] {
  const cells: Cell[] = [];
  let from = 0;
  const push = (text: string, at: number) => {
    if (text.trim()) cells.push({ start: offset + at + (text.length - text.trimStart().length), end: offset + at + text.trimEnd().length, text: text.trim() });
  };
  const re = sep === '|' ? /\|/gu : sep === ';' ? /;/gu : sep === ',' ? /,/gu : CELL_GAP_RE;
  re.lastIndex = 0;
  for (const m of line.matchAll(re)) {
    push(line.slice(from, m.index), from);
    from = m.index! + m[0].length;
  }
  push(line.slice(from), from);
  return cells;
}

/** A header cell's label and the unit it gives its column, if any. */
function headerUnit(full: string): { label: string; unit: string | null } {
  // (A note in brackets after the unit — "Outdoor °C (mean)", "Power W (avg.)" — is the label's.)
  const note = /^(.*?\S)[^\S\n]*\((?:mean|avg\.?|average|measured|typ\.?|nominal|max\.?)\)$/iu.exec(full);
  const h = note ? note[1] : full;
  const bracket = HEADER_UNIT_RE.exec(h);
  if (bracket && HEADER_UNITS.has(bracket[2].trim())) return { label: bracket[1], unit: bracket[2].trim() };
  const trailing = HEADER_TRAILING_UNIT_RE.exec(h);
  if (trailing && HEADER_UNITS.has(trailing[2])) return { label: trailing[1], unit: trailing[2] };
  return { label: h, unit: null };
}

/**
 * A table set as text with its labels in a header row and its values in the rows below ("ΔT (K)  Qc (W)
 * COP" over "40  18.5  0.60"; "Hot side (°C) | ΔT (°C) | Output"; "T_out °C;Heat kWh;…" with decimal
 * commas): each value row is read as its cells, each cell after its column's label, with the header's
 * unit where the cell gives none ("ΔT 40 K; Qc 18.5 W; COP 0.60") — offsets mapped back, so a figure
 * still points at its cell. A rule under the header is passed over; a table with a unit column of its
 * own is left to the sheet reader.
 */
export function labelTableRows(pasted: string): Unwrapped | null {
  const lines = pasted.split('\n');
  let offset = 0;
  const starts = lines.map((l) => {
    const s = offset;
    offset += l.length + 1;
    return s;
  });
  /** Replacements: the value row at this line index, as pieces (text, and where each piece maps). */
  const rows = new Map<number, { text: string; at: number; span?: boolean }[]>();
  for (let i = 0; i + 1 < lines.length; i++) {
    if (rows.has(i)) continue;
    const sep = separatorOf(lines[i]);
    const header = cellsOf(lines[i], starts[i], sep);
    // ("Mass item   t" over "Propellant   420": a list of items under a header that gives only the unit.)
    if (header.length === 2 && HEADER_UNITS.has(header[1].text.replace(/^[([]|[)\]]$/gu, '')) && !DIGIT_CELL_RE.test(header[0].text)) {
      const unit = header[1].text.replace(/^[([]|[)\]]$/gu, '');
      for (let j = i + 1; j < lines.length; j++) {
        if (separatorOf(lines[j]) !== sep) break;
        const values = cellsOf(lines[j], starts[j], sep);
        if (values.length !== 2 || !/\p{L}/u.test(values[0].text) || !/^[-−+~≈]?[\d.,]+$/u.test(values[1].text)) break;
        rows.set(j, [
          { text: `${values[0].text}: `, at: values[0].start },
          { text: values[1].text, at: values[1].start, span: true },
          { text: ` ${unit}`, at: values[1].end - 1 },
        ]);
      }
      continue;
    }
    if (header.length < 3 || header.some((c) => DIGIT_CELL_RE.test(c.text)) || header.some((c) => !/\p{L}|%/u.test(c.text)) || header.some((c) => UNIT_COLUMN_RE.test(c.text))) continue;
    for (let j = i + 1; j < lines.length; j++) {
      if (RULE_LINE_RE.test(lines[j]) && lines[j].includes('-')) continue;
      if (separatorOf(lines[j]) !== sep) break;
      const values = cellsOf(lines[j], starts[j], sep);
      if (values.length !== header.length) break;
      const numeric = values.filter((c) => VALUE_CELL_RE.test(c.text)).length;
      if (numeric < Math.max(2, Math.ceil(values.length / 2))) break;
      const pieces: { text: string; at: number; span?: boolean }[] = [];
      values.forEach((v, k) => {
        const { label, unit } = headerUnit(header[k].text);
        if (k > 0) pieces.push({ text: '; ', at: v.start });
        pieces.push({ text: `${label} `, at: v.start });
        pieces.push({ text: v.text, at: v.start, span: true });
        // (The header's unit, only after a bare number: "40" under "ΔT (K)".)
        if (unit && /^[-−+~≈]?[\d.,]+$/u.test(v.text)) pieces.push({ text: ` ${unit}`, at: v.end - 1 });
      });
      rows.set(j, pieces);
    }
  }
  if (rows.size === 0) return null;
  let text = '';
  const toPasted: number[] = [];
  lines.forEach((line, i) => {
    if (i > 0) {
      text += '\n';
      toPasted.push(starts[i] - 1);
    }
    const pieces = rows.get(i);
    if (!pieces) {
      for (let k = 0; k < line.length; k++) toPasted.push(starts[i] + k);
      text += line;
      return;
    }
    for (const p of pieces) {
      for (let k = 0; k < p.text.length; k++) toPasted.push(p.span ? p.at + k : p.at);
      text += p.text;
    }
  });
  toPasted.push(pasted.length);
  return { text, toPasted };
}

/** Both passes: a PDF's wraps undone, then its tables' rows labelled; the offsets map back through both. */
export function readableLayout(pasted: string): Unwrapped | null {
  const first = unwrapPdfText(pasted);
  const base = first?.text ?? pasted;
  const second = labelTableRows(base);
  if (!second) return first;
  if (!first) return second;
  return { text: second.text, toPasted: second.toPasted.map((i) => first.toPasted[i]) };
}
