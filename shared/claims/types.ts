/**
 * The claim check (DESIGN.md §4–§5, issue 6): a pasted claim → the matching entries, the figures
 * found in it, the standard checks run on those figures, and a referee paragraph with references.
 * These types are the contract between shared/claims/* (extraction, planning, the paragraph), the
 * server route (server/routes/claim-checks.ts) and the screen (components/claims/*).
 */
import type { CheckName, CheckVerdict } from '../checks/types';
import type { CitationStyle } from '../entries/citations';
import type { QuantityValue } from '../worksheet/types';

/** Longest pasted text the claim check takes (characters, UTF-16 code units); more answers 413. */
export const CLAIM_TEXT_MAX = 20_000;
/** Most figures a request may send back after the reader fixed some. */
export const CLAIM_FIGURES_MAX = 50;

export const FIGURE_KINDS = [
  'thrust',
  'power',
  'energy',
  'temperature',
  'temperature-difference',
  'efficiency',
  'cop',
  'quantum-efficiency',
  'mass',
  'speed',
  'current',
  'voltage',
  'duration',
  'specific-impulse',
  'thrust-per-power',
  'specific-power',
  'gas-flow',
] as const;
export type FigureKind = (typeof FIGURE_KINDS)[number];

/** The coherent SI unit (mathjs syntax) a figure of each kind is held in; "" for a pure number. */
export const FIGURE_SI_UNIT: Record<FigureKind, string> = {
  thrust: 'N',
  power: 'W',
  energy: 'J',
  temperature: 'K',
  // A difference of temperature: "a 20 degC difference" is 20 K (parseQuantity reads "20 K"; the reader converts).
  'temperature-difference': 'K',
  efficiency: '',
  cop: '',
  // Particles out per particle in (photons per electron, or electrons per photon): not an energy ratio.
  'quantum-efficiency': '',
  mass: 'kg',
  speed: 'm / s',
  current: 'A',
  voltage: 'V',
  duration: 's',
  'specific-impulse': 's',
  'thrust-per-power': 'N / W',
  'specific-power': 'W / kg',
  // A volume of gas per unit time ("3 L/min of HHO"), at the conditions the text states.
  'gas-flow': 'm^3 / s',
};

/** Short names for each kind, for choice chips. */
export const FIGURE_KIND_SHORT: Record<FigureKind, string> = {
  thrust: 'Thrust',
  power: 'Power',
  energy: 'Energy',
  temperature: 'Temperature',
  'temperature-difference': 'ΔT',
  efficiency: 'Efficiency',
  cop: 'COP',
  'quantum-efficiency': 'Quantum eff.',
  mass: 'Mass',
  speed: 'Speed',
  current: 'Current',
  voltage: 'Voltage',
  duration: 'Duration',
  'specific-impulse': 'Isp',
  'thrust-per-power': 'Thrust/power',
  'specific-power': 'Power/mass',
  'gas-flow': 'Gas flow',
};

/** Words for each kind, for the screen. */
export const FIGURE_KIND_LABEL: Record<FigureKind, string> = {
  thrust: 'Thrust (force)',
  power: 'Power',
  energy: 'Energy',
  temperature: 'Temperature',
  'temperature-difference': 'Temperature difference',
  efficiency: 'Efficiency',
  cop: 'Coefficient of performance',
  'quantum-efficiency': 'Quantum efficiency (particles out per particle in)',
  mass: 'Mass',
  speed: 'Speed',
  current: 'Electric current',
  voltage: 'Voltage',
  duration: 'Duration',
  'specific-impulse': 'Specific impulse',
  'thrust-per-power': 'Thrust per unit power',
  'specific-power': 'Power per unit mass',
  'gas-flow': 'Flow of gas (volume per unit time)',
};

/**
 * What the figure is, read from the words around it:
 *  - power and energy: 'in' (drawn, supplied, consumed, input), 'out' (delivered, produced, output) or
 *    'excess' (said to come out over and above the input: out = in + excess);
 *  - temperature: 'hot' or 'cold' (source/sink, ambient, room, outside …);
 *  - cop: 'heating' or 'cooling';
 *  - mass: 'wet' (at the start, with propellant, fuelled, total), 'dry' (at the end, empty) or
 *    'propellant' (the propellant alone);
 *  - speed: 'exhaust' (exhaust or jet speed) or 'delta-v' (a claimed change of speed);
 *  - null when the words do not say.
 */
/**
 * What a figure is to the device. 'aside': a figure of something else the text mentions (the time it
 * took to build, the mass of the test stand, the room's temperature when the machine's own sides are
 * given): kept and shown, never used by a check.
 */
export const FIGURE_ROLES = ['in', 'out', 'excess', 'hot', 'cold', 'heating', 'cooling', 'wet', 'dry', 'propellant', 'exhaust', 'delta-v', 'aside'] as const;
export type FigureRole = (typeof FIGURE_ROLES)[number] | null;

/** Words said before or around a figure that qualify it ("up to", "about", "±"). */
export type FigureHedge = 'up-to' | 'about' | 'at-least' | 'at-most' | 'more-than' | 'less-than';

export interface Figure {
  /** "f1", "f2", … in order of appearance (or of the list the reader sent back). */
  id: string;
  kind: FigureKind;
  /** The figure as parseQuantity reads it: "0.2 lbf", "45 %", "300 degC", "3.2" (a COP). For a range, its lower end. */
  quantity: string;
  /** The figure exactly as it appears in the text ("0.2 lbf", "1.5 kilowatts", "45%", "3–6 mN"); the quantity when typed by hand. */
  text: string;
  /** UTF-16 offsets of `text` in the pasted text (text.slice(start, end) === figure.text); null when typed by hand. */
  start: number | null;
  end: number | null;
  /** Value in FIGURE_SI_UNIT[kind]; for a range, the lower end. */
  si: number;
  /** FIGURE_SI_UNIT[kind]. */
  unit: string;
  /** formatQuantity of si, e.g. "889.6 mN", "293.1 K", "0.45". */
  display: string;
  role: FigureRole;
  /**
   * A range ("3–6 mN", "between 0.5 and 1.5 kW", "1.2 ± 0.3 mN"): its upper end. `si`/`quantity`
   * are then the lower end. A check takes whichever end is most favourable to the claim, and says so.
   */
  upper?: { quantity: string; si: number; display: string };
  /** A hedge said with it ("up to 5 mN", "about 2 kW", "more than 3 kW"). */
  hedge?: FigureHedge;
  /** For a figure the text gives through others ("12 A at 24 V", "4 W more than the 20 W it draws", "self-running"): how it was got, in words. */
  derived?: string;
  /** Words of the text the reader found ambiguous, and how it read them (the reader can change it). */
  assumption?: string;
}

/** A figure as the reader sends it back after fixing it (quantity retyped, kind or role changed). */
export interface FigureInput {
  kind: FigureKind;
  quantity: string;
  /** The upper end of a range, typed ("6 mN"). */
  upper?: string | null;
  role?: FigureRole;
  /** Kept from the extracted figure so that the screen can still point at the place in the text. */
  text?: string;
  start?: number | null;
  end?: number | null;
}

/** One check of the kit chosen for the figures, with the typed inputs it was run with. */
export interface PlannedCheck {
  check: CheckName;
  /** Typed inputs for runCheck (figure quantities, or a stated assumption such as "1 h" of running). */
  inputs: Record<string, string>;
  /** Ids of the figures used. */
  uses: string[];
  /** Why this check applies, in a sentence ("The text gives a thrust and the power that produces it."). */
  why: string;
  /** Assumptions made beyond the text's figures, in plain words (may be empty). */
  assumptions: string[];
}

export interface ClaimCheckRun extends PlannedCheck {
  title: string;
  /** The check's outputs (display strings included) and verdict; plots left out. */
  outputs: { name: string; label: string; si: number; unit: string; display: string }[];
  verdict: CheckVerdict;
  inputsUsed: Record<string, QuantityValue>;
  /** Path of the check screen with these inputs filled in, e.g. "/checks/photon-bound?F_claimed=0.2%20lbf&P=1.5%20kW". */
  permalink: string;
  /** The law the check rests on, in words ("conservation of linear momentum", "the second law of thermodynamics"). */
  law: string;
  /**
   * The finding in a referee's words: 'breaks' (the claim's figures break the law), 'consistent'
   * (they are consistent with it). Same as !verdict.holds / verdict.holds.
   */
  finding: 'breaks' | 'consistent';
  /** One sentence of the result with the claim's numbers as in print ("… 2.5 × 10¹¹ times the bound …"). */
  sentence: string;
}

/** A check the text's figures point to but cannot run: it needs a figure the text does not give. */
export interface ClaimCheckNeed {
  check: CheckName;
  title: string;
  /** What is missing, in words ("the speed of the craft", "the temperature of the cold side"). */
  missing: string[];
  /** Why the check applies, in a sentence. */
  why: string;
  uses: string[];
}

export interface ClaimMatch {
  slug: string;
  title: string;
  version: number;
  score: number;
  /** The normalised index terms that matched. */
  terms: string[];
  /** The words of the pasted text that matched (as written, each once, in order of first appearance). */
  words: string[];
  /** Permanent URL of this version. */
  url: string;
  inBrief: string;
  /**
   * Set when the check's finding on the claim's own figures led to this entry (not, or not only,
   * its words), saying why: "it states a speed above the speed of light".
   */
  finding?: string;
}

export interface ParagraphReference {
  /** 1, 2, … in order of first citation in the paragraph. */
  n: number;
  /** CSL id of the item (e.g. "resonant-cavity-thruster-v1" for a Counterweight entry). */
  id: string;
  /** True for a Counterweight entry version. */
  counterweight: boolean;
  /** The reference formatted by citation-js in the chosen style, plain text, without the number. */
  text: string;
}

/** Whom the paragraph is written for: the four kinds of report readers hand in. */
export const PARAGRAPH_VARIANTS = ['referee', 'examiner', 'grant', 'journalist'] as const;
export type ParagraphVariant = (typeof PARAGRAPH_VARIANTS)[number];
export const PARAGRAPH_VARIANT_LABEL: Record<ParagraphVariant, string> = {
  referee: 'Referee report',
  examiner: "Patent examiner's objection",
  grant: 'Grant review',
  journalist: "Journalist's note",
};

export interface ClaimParagraph {
  variant: ParagraphVariant;
  style: CitationStyle;
  /** The paragraph proper, with in-text markers [1], [2] … */
  body: string;
  references: ParagraphReference[];
  /** body + a blank line + "References" + the numbered list: what "Copy" puts on the clipboard. */
  text: string;
}

export interface ClaimCheckRequest {
  text: string;
  style?: CitationStyle;
  /** Which paragraph comes first as `paragraph` (all four are in `paragraphs`); default 'referee'. */
  variant?: ParagraphVariant;
  /** The figures as the reader fixed them; when present, the text is not searched for figures again. */
  figures?: FigureInput[];
}

export interface ClaimCheckResult {
  style: CitationStyle;
  textLength: number;
  matches: ClaimMatch[];
  figures: Figure[];
  checks: ClaimCheckRun[];
  /** Checks the figures point to that need a figure the text does not give: never run on a default. */
  needs: ClaimCheckNeed[];
  /** The paragraph of the requested variant (= paragraphs[variant]). */
  paragraph: ClaimParagraph;
  paragraphs: Record<ParagraphVariant, ClaimParagraph>;
  variant: ParagraphVariant;
  /** Plain-words notes, e.g. "No thrust figure was found, so the photon bound was not run." */
  notes: string[];
}

export interface SavedClaimCheckDto {
  /** Unguessable token (at least 128 random bits, base64url); the share link is `${origin}/check/${token}`. */
  token: string;
  url: string;
  createdAt: string;
  /** The pasted text and what was sent back, so that the screen can re-run it. */
  text: string;
  style: CitationStyle;
  figures: FigureInput[] | null;
  result: ClaimCheckResult;
  /** Whether the viewer owns it (and so may delete it). */
  mine: boolean;
}

export interface SavedClaimCheckSummaryDto {
  token: string;
  url: string;
  createdAt: string;
  /** The first 120 characters of the text. */
  preview: string;
  topMatch: string | null;
}
