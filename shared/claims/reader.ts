/**
 * The figure reader of the claim check (issue 11, item 1): the figures of a pasted claim, each with
 * its kind, SI value, role, the words it was read from and its place in the text — read the way
 * claims state them, not only as "0.2 lbf".
 *
 * How it reads a text:
 *  1. Numbers. Digits with signs, decimals, English thousands separators ("1,500"), decimal commas
 *     where they cannot be thousands ("2,5 kW", "0,75 kW"), e-notation and "× 10⁻³"/"x 10^-3"; a
 *     thousand written "5K"/"5k" before a noun that is not a temperature ("5K cycles"); and numbers
 *     in words ("two weeks", "three and a half hours", "twelve amps"), recognised by the
 *     `compromise` package (a well-kept English NLP library) and kept only where a unit follows.
 *  2. Units. The vocabulary in figures-vocabulary.ts (symbols with their case, words in any case,
 *     the longest form winning), then mathjs (parseQuantity) for the conversion. Compounds of a
 *     thrust over a power ("mN/kW", "µN per watt") are a thrust per power, of a power over a mass
 *     ("W/kg") a specific power; other compounds ("W/m²", "N·m") are not figures.
 *  3. Kinds by context, in the same sentence:
 *     - a temperature with difference words ("a 20 °C temperature difference", "ΔT of 20 K", "40
 *       degrees above ambient") is a temperature difference (20 °C of difference is 20 K);
 *     - seconds after "Isp"/"specific impulse" are a specific impulse;
 *     - a percentage: with quantum-efficiency words (EQE, IQE, quantum yield, photons per electron)
 *       a quantum efficiency; with heat-pump words ("350 % efficient") a heating COP, with
 *       refrigerator words a cooling COP; with efficiency words an efficiency; "30 % of the speed
 *       of light" a speed; other percentages are not figures;
 *     - a bare number after "COP", "efficiency", "EQE", "over-unity ratio of", or in "1.3 units back for
 *       every unit", "three times the energy it takes", "output is 3 times the input" (a gain, read as
 *       an efficiency).
 *  4. Ranges and hedges: "3–6 mN", "3 to 6 mN", "between 0.5 and 1.5 kW", "from 2 to 4 kW" and
 *     "1.2 ± 0.3 mN" are one figure with an upper end; "up to", "about", "~", "at least", "more
 *     than" … are kept as the figure's hedge.
 *  5. Roles from the words around (figures-vocabulary.ts): in/out/excess for power and energy,
 *     hot/cold for temperatures, heating/cooling for a COP, wet/dry/propellant for masses,
 *     exhaust/delta-v for speeds.
 *  6. Relations, as derived figures with the words they came from:
 *     - a current and a voltage in one clause ("12 A at 24 V") → a power I·V;
 *     - an excess over a stated input ("4 W more heat than the 20 W it draws") → out = in + excess;
 *     - "self-running", "needs no supply" … (not where the device harvests an outside flow) → in = 0;
 *     - one temperature and a difference → the other temperature (hot = cold + ΔT, or cold = hot − ΔT).
 *  Text damaged on its way (reader/repair.ts) is read as meant first: UTF-8 read as Windows-1252 ("Â°C"),
 *  a symbol lost to "?", "O" and "l" typed for 0 and 1 inside numbers, units run together, words in
 *  capitals, a slip put right at once; offsets map back to the pasted text.
 *  Text copied out of a PDF (reader/pdf-text.ts) is read as written: words broken at a line's end joined,
 *  wrapped lines read as one sentence, ligatures as letters, and a table set as text with a header row
 *  read cell by cell after its column's label; offsets map back to the pasted text.
 *  TeX left in a text ("$\\eta = 0.42$", "1.7 \\times 10^{-6} N", "44.7\\,\\%") is read as written plainly
 *  (reader/tex.ts), the offsets mapped back to the pasted text.
 *  Numbers after a label ("Figure 2 A", "Section 3.2", "p. 12", "Eq. 4", "§ 3") and years before an
 *  initial ("in 2019 A. N. Other") are not figures.
 *
 * Which recogniser: `@microsoft/recognizers-text-number-with-unit` (1.3.1) was tried on the claim
 * families and left aside: it found no dimension in "3–6 mN", "1.5 kW" or "40 kWh", read "20 pounds of
 * thrust" as a mass, has no range recogniser in its JavaScript port, and weighs 13 MB with half a second
 * of first call. `compromise` (14.x, kept up to date, MIT) reads numbers in words well ("three and a
 * half", "twenty-four") and is used for that alone; units are our vocabulary (figures-vocabulary.ts,
 * the trade's spellings) converted by mathjs, ranges and relations are ours, as no library reads them.
 *
 * Several devices in one text, each on a line of its own (a round-up, a catalogue page, quotes A to C):
 * each item is read with the others blanked out and one is checked, the others' figures set aside
 * (shared/claims/plan/items.ts).
 *
 * The passes, in shared/claims/reader/: repair.ts and pdf-text.ts (before 1), numbers.ts and units.ts (1, 2), kinds.ts, temperatures.ts,
 * ranges-hedges.ts and roles.ts (3–5), figures.ts (a text's figures, pass by pass), comparisons.ts,
 * relations.ts, roles-by-context.ts, temperatures.ts and durations.ts (6); context.ts and draft.ts
 * hold what the passes share.
 */
import type { Figure } from './types';
import { focusOneItem } from './plan/items';
import { runClaimChecks } from './plan/run';
import { readFigures } from './reader/figures';
import { readableLayout, type Unwrapped } from './reader/pdf-text';
import { repairTyping } from './reader/repair';
import { detex } from './reader/tex';
import { unitAt } from './reader/units';

/**
 * The figures in a pasted text, in order of appearance, with ids "f1", "f2", …; derived figures
 * follow the figures they come from. See the file's comment for what is read.
 */
export function extractFigures(text: string): Figure[] {
  // Several devices in one text, each on a line of its own: the figures of all but the one checked are
  // set aside (plan/items.ts).
  return focusOneItem(text, readPasted(text), readPasted, runClaimChecks);
}

function readPasted(text: string): Figure[] {
  // Text damaged on its way ("Â°C", "2O W", "25 ?C"): read as the writer meant it.
  return readRewritten(text, repairTyping(text), readLaidOut);
}

function readLaidOut(text: string): Figure[] {
  // Text copied out of a PDF ("coeffi-\ncient", lines wrapped mid-sentence, "efﬁciency"): read as written.
  return readRewritten(text, readableLayout(text), readWithTex);
}

/** A text read as rewritten (or as pasted, where nothing was), each figure's offsets and words pointing back at the pasted text. */
function readRewritten(text: string, rewritten: Unwrapped | null, read: (text: string) => Figure[]): Figure[] {
  if (rewritten === null) return read(text);
  return pointBack(read(rewritten.text), text, (f) => {
    const start = rewritten.toPasted[f.start];
    return [start, f.end > f.start ? rewritten.toPasted[f.end - 1] + 1 : start];
  });
}

function readWithTex(text: string): Figure[] {
  const plain = detex(text);
  if (plain === null) return readPlain(text);
  // TeX left in the text ("$\\eta = 0.42$", "1.7 \\times 10^{-6} N"): read as plainly written, then
  // each figure's offsets and words point back at the pasted text.
  return pointBack(readPlain(plain.text), text, (f) => {
    const start = plain.toPasted[f.start];
    let end = plain.toPasted[f.end];
    while (end > start + 1 && /[\s$]/.test(text[end - 1])) end--;
    return [start, end];
  });
}

/** Figures read from a rewritten text, their offsets and words moved back to the pasted text. */
function pointBack(figures: Figure[], pasted: string, place: (f: { start: number; end: number }) => [number, number]): Figure[] {
  return figures.map((f) => {
    if (f.start === null || f.end === null) return f;
    const [start, end] = place({ start: f.start, end: f.end });
    return { ...f, start, end, text: pasted.slice(start, end) };
  });
}

/** A dotted leader between a label and its value in a table set as text ("Conversion efficiency ...... 5,5 %"). */
const LEADER_RE = /[^\S\n]*(?:\.{3,}|…+|·{3,}|_{3,})[^\S\n]*(?=[-−+~≈]?\d)/gu;

/** A table's header cell naming the unit column ("Unit", "Units", "Unit of measure"). */
const UNIT_HEADER_RE = /^[^\S\n]*(?:units?|unit of measure|dimension|UoM)[^\S\n]*$/iu;
/** A header cell that names its column's unit: "Heater head (°C)", "Power [kW]". */
const HEADER_UNIT_RE = /\p{L}[^|\t\n]*?[([]([^()[\]\d|\t\n]{1,8})[)\]][^\S\n]*$/u;
/** A cell that is a unit alone ("kW", "°C", "%", "N/kW", "m/s"): short, no digits but exponents. */
const UNIT_CELL_RE = /^[^\S\n]*[^\d\s|\t][^\d|\t]{0,11}[^\S\n]*$/u;

/**
 * A table pasted as text with its units in a column of their own ("Heat through the modules | 1.6 | kW |",
 * tab-separated likewise, under a header with a "Unit" column): the separator between a value and its
 * unit is blanked (to the same length, so offsets are kept), and the value is read with its unit.
 */
export function joinUnitColumns(text: string): string {
  const lines = text.split('\n');
  let unitCol = -1;
  let sep: string | null = null;
  /** Units named in header cells ("Heater head (°C)"), by column, for a pipe table. */
  let headerUnits: (string | null)[] = [];
  const out = lines.map((line) => {
    const s = line.includes('|') ? '|' : line.includes('\t') ? '\t' : null;
    if (s === null) {
      unitCol = -1;
      headerUnits = [];
      return line;
    }
    const cells = line.split(s);
    const header = cells.findIndex((c) => UNIT_HEADER_RE.test(c));
    if (header > 0) {
      unitCol = header;
      sep = s;
      return line;
    }
    const named = cells.map((c) => HEADER_UNIT_RE.exec(c)?.[1] ?? null);
    if (s === '|' && named.some((u) => u !== null) && cells.every((c) => !/^[^\S\n]*[-−+]?\d[\d.,]*[^\S\n]*$/u.test(c))) {
      headerUnits = named;
      return line;
    }
    if (s === '|' && headerUnits.length > 0) {
      // A bare number under a header that names its unit: the unit written into the cell's own blank
      // space, when there is room (offsets kept).
      const filled = cells.map((c, i) => {
        const unit = headerUnits[i];
        const m = /^([^\S\n]*[-−+]?\d[\d.,]*)([^\S\n]*)$/u.exec(c);
        return unit && m && m[2].length >= unit.length + 1 ? `${m[1]} ${unit}${' '.repeat(m[2].length - unit.length - 1)}` : c;
      });
      return filled.join('|');
    }
    if (unitCol < 1 || s !== sep || cells.length <= unitCol) return headerlessUnitCells(line, s, cells);
    const value = cells[unitCol - 1];
    const unit = cells[unitCol];
    if (!/\d[^\S\n]*$/u.test(value) || !UNIT_CELL_RE.test(unit) || /^[^\S\n]*[-—–]+[^\S\n]*$/u.test(unit)) return line;
    // Blank the separator between the value cell and the unit cell.
    const at = cells.slice(0, unitCol).join(s).length;
    return line.slice(0, at) + ' ' + line.slice(at + 1);
  });
  return out.join('\n');
}

/** A cell that is nothing but a unit the reader knows ("%", "kW", "°C", "N/kW"). */
function unitOnly(cell: string): boolean {
  const t = cell.trim();
  if (t === '%' || t === '') return t === '%';
  if (/\d/.test(t) || t.length > 12) return false;
  const u = unitAt(t, 0);
  return u !== null && u.end === t.length;
}

/**
 * A row with no "Unit" header above it whose cell ending in a bare number is followed by a cell holding a unit alone
 * ("Conversion efficiency | 5.0 | % | output / heat", "Electrical output\t80\tW"): the separator between
 * them is blanked (offsets kept), and the value is read with its unit.
 */
function headerlessUnitCells(line: string, s: string, cells: string[]): string {
  let out = line;
  let at = 0;
  for (let i = 0; i + 1 < cells.length; i++) {
    at += cells[i].length;
    if (/(?<![\p{L}\d.,-])[-−+]?\d[\d.,]*[^\S\n]*$/u.test(cells[i]) && unitOnly(cells[i + 1])) out = out.slice(0, at) + ' ' + out.slice(at + 1);
    at += s.length;
  }
  return out;
}

/**
 * A pointer to a figure, a table, an equation or a reference in brackets ("(see Table 2)", "(Fig. 3b)",
 * "[12]", "[3, 7–9]"), or a patent's reference sign after a part's name ("the drive motor (1406)"): blanked to the same length, so that the words before it reach the figure after it
 * ("The output (Fig. 3) was 40 W").
 */
const POINTER_RE =
  /(?<=\p{L})[^\S\n]*\(\d{1,4}[a-z]?(?:[^\S\n]*[,–-][^\S\n]*\d{1,4}[a-z]?)*\)(?![^\S\n]*(?:%|°|(?:[kMGmµu]?(?:W|J|N|V|A|Wh|K|Hz|s|g|m|t)|kg|hp|PS|BTU|lbf?)(?!\p{L})))|\((?:(?:see|cf\.?|compare)[^\S\n]+)?(?:Fig(?:ure)?s?\.?|Tables?|Tab\.|Eqs?\.?|Equations?|Refs?\.?|Sections?|Sec\.|§|Appendix|Supplementary|Suppl?\.|Methods|Note)[^\S\n]*[^()\n]{0,30}\)|\[\d{1,3}(?:[^\S\n]*[,–-][^\S\n]*\d{1,3})*\]/gu;

function readPlain(text: string): Figure[] {
  // (A middle dot or bullet set between items of a line — "2,1 km/s · propellant 0,35 kg" — is a separator, not
  // a product of units: read as a semicolon, places kept.)
  const joined = joinUnitColumns(text)
    .replace(POINTER_RE, (m) => ' '.repeat(m.length))
    .replace(/(?<=\S)([^\S\n]+)[·•]([^\S\n]+)(?=\S)(?!(?:m|s|h|min|kg|g|A|V|W|K|mol|rad|sr|N|J|Pa|Hz|°C)(?![\p{L}]))/gu, (_m, a: string, b: string) => `${a};${b}`);
  // A leader is read as the colon it stands for, blanked to the same length so offsets are kept.
  const led = LEADER_RE.test(joined) ? joined.replace((LEADER_RE.lastIndex = 0, LEADER_RE), (m) => `:${' '.repeat(m.length - 1)}`) : joined;
  LEADER_RE.lastIndex = 0;
  if (led === text) return readUnled(text);
  return readUnled(led).map((f) => {
    if (f.start === null || f.end === null) return f;
    // (A unit written into a cell's blank space: the figure's words end where the pasted text's do.)
    let end = f.end;
    while (end > f.start + 1 && /\s/u.test(text[end - 1])) end--;
    return { ...f, end, text: text.slice(f.start, end) };
  });
}

function readUnled(text: string): Figure[] {
  const restated: [number, number][] = [];
  const figures = readFigures(text, restated);
  if (restated.length === 0) return figures;
  // "2 kW (2.7 hp) of electrical input": read again with the restatements blanked out (offsets kept),
  // so that the words after a restatement reach the figure it restates.
  let blanked = text;
  for (const [a, b] of restated) blanked = blanked.slice(0, a) + ' '.repeat(b - a) + blanked.slice(b);
  return readFigures(blanked, []).map((f) => (f.start === null || f.end === null ? f : { ...f, text: text.slice(f.start, f.end) }));
}
