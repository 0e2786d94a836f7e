/**
 * Figures of other business (the claim reader, shared/claims/reader.ts): in a document of several
 * items — minutes with agenda items, a newsletter with several stories, a report with sections — the
 * figures of an item that says nothing of a claim (the car park's 7 kW charging points, the new
 * boiler's 18 kW, a freezer at −80 °C) are set aside, so that they are not taken for the claimed
 * device's input, output or sides.
 */
import { sentenceAround, windowStart } from './context';
import { siOf, type Draft } from './draft';

/** Words of a claim a check can be run on, or of the device's working. */
const CLAIM_WORDS_RE =
  /(?<!\p{L})(?:efficien\w*|COP|coefficients? of performance|thrust\w*|propel\w*|propulsion|reactionless|over-?unity|free energy|perpetual|self-(?:running|powered|sustaining|charging|looping)|Carnot|speed of light|faster than light|superluminal|delta-v|Δv|Δ-v|specific impulse|Isp|excess (?:heat|power|energy)|more (?:energy|power|heat|electricity) (?:out|than)|puts? out more|gives? (?:back|out) more|heat pumps?|engines?|motors?|generators?|thrusters?|drives?|harvesters?|rockets?|craft|spacecraft|stages?|Peltier|thermoelectric|Stirling|claims?|claimed|claiming|inputs?|outputs?|breakthrough|prototype|invent\w*|device)(?!\p{L})/giu;

/** Nouns of machines: an item that names the same machine as an item with a claim is about it too. */
const MACHINE_NOUNS = [
  'pump', 'engine', 'motor', 'generator', 'alternator', 'dynamo', 'fridge', 'refrigerator', 'freezer', 'cooler', 'chiller',
  'module', 'thruster', 'drive', 'toroid', 'transformer', 'circuit', 'coil', 'battery', 'batteries', 'cell', 'panel', 'heater',
  'boiler', 'stove', 'furnace', 'turbine', 'wheel', 'flywheel', 'reactor', 'cavity', 'resonator', 'lifter', 'craft', 'rocket',
  'stage', 'probe', 'vehicle', 'car', 'bike', 'lamp', 'LED', 'laser', 'converter', 'inverter', 'harvester', 'device', 'unit',
  'machine', 'prototype', 'rig', 'apparatus', 'box', 'plant', 'kit', 'array', 'stack', 'loop', 'magnet', 'rotor', 'emitter',
  'beam', 'antenna', 'capacitor', 'charger', 'compressor', 'collector', 'element', 'plate', 'bank', 'tank', 'sail', 'satellite', 'charging point', 'carport', 'solar', 'photovoltaic', 'PV', 'lift', 'elevator', 'ventilation', 'lighting', 'fan',
];
const MACHINE_NOUN_RE = new RegExp(`(?<!\\p{L})(?:${MACHINE_NOUNS.join('|')})(?:e?s)?(?!\\p{L})`, 'giu');
const machineNouns = (block: string) => new Set([...block.matchAll(MACHINE_NOUN_RE)].map((m) => m[0].toLowerCase().replace(/(?<=[^s])e?s$|(?<=ss)es$/u, '')));

/** A sheet's row: a label, then leader dots, a bar, a tab, wide spaces or a colon, then a number. */
const SHEET_ROW_RE = /^[^\n]{2,70}?(?:\.{3,}|…|\||\t|[^\S\n]{3,}|:)[^\S\n]*[-−+]?\d/u;

/** Kinds of figure that only a claim's device has (a thrust, a COP, a Δv…). */
const CLAIM_KINDS = new Set(['thrust', 'cop', 'efficiency', 'thrust-per-power', 'quantum-efficiency', 'specific-impulse', 'temperature-difference', 'speed', 'specific-power', 'gas-flow']);

/** Kinds set aside when said in an item of other business. */
const ASIDE_KINDS = new Set(['power', 'energy', 'temperature', 'mass', 'duration', 'current', 'voltage']);

/** Where the blocks of the text start: after a blank line, or at a numbered item or a heading line. */
function blockStarts(text: string): number[] {
  const starts = [0];
  const re = /\n[^\S\n]*\n+|\n(?=[^\S\n]*(?:(?:item|agenda item|point)[^\S\n]+)?\d{1,2}[.)][^\S\n]+\p{Lu})/giu;
  for (const m of text.matchAll(re)) starts.push(m.index! + m[0].length);
  return [...new Set(starts)].sort((a, b) => a - b);
}

export function asideOtherTopics(text: string, drafts: Draft[]): void {
  const starts = blockStarts(text);
  if (starts.length < 3) return;
  const blockOf = (at: number) => {
    let k = 0;
    while (k + 1 < starts.length && starts[k + 1] <= at) k++;
    return k;
  };
  const score = starts.map(() => 0);
  for (let k = 0; k < starts.length; k++) {
    const block = text.slice(starts[k], starts[k + 1] ?? text.length);
    score[k] += [...block.matchAll(CLAIM_WORDS_RE)].length;
  }
  for (const d of drafts) if (d.role !== 'aside' && CLAIM_KINDS.has(d.kind)) score[blockOf(d.start)] += 2;
  // (A block that states both what goes in and what comes out is a ledger of a device's working.)
  for (let k = 0; k < starts.length; k++) {
    const own = drafts.filter((d) => blockOf(d.start) === k);
    if (own.some((d) => d.role === 'in') && own.some((d) => d.role === 'out')) score[k] += 2;
  }
  if (!score.some((s) => s > 0)) return;
  const nouns = starts.map((from, k) => machineNouns(text.slice(from, starts[k + 1] ?? text.length)));
  const claimNouns = new Set(nouns.flatMap((n, k) => (score[k] > 0 ? [...n] : [])));
  // An item of other business: no word of a claim, no figure only a claim's device has, and a machine of
  // its own, none of those named in an item that has them.
  // (Nor the one data block of a sheet, "Cooling capacity at +5 °C coolant ........ 1,200 W" line after
  // line, beside a blurb: the sheet is the device's own data, whatever the blurb names.)
  const sheetBlocks = starts.map((from, k) => text.slice(from, starts[k + 1] ?? text.length).split('\n').filter((line) => SHEET_ROW_RE.test(line)).length >= 3);
  const oneSheet = sheetBlocks.filter(Boolean).length === 1;
  const other = score.map((s, k) => s === 0 && !(oneSheet && sheetBlocks[k]) && nouns[k].size > 0 && ![...nouns[k]].some((n) => claimNouns.has(n)));
  for (const d of drafts) {
    if (d.role !== null || !ASIDE_KINDS.has(d.kind) || d.derived) continue;
    if (other[blockOf(d.start)]) d.role = 'aside';
  }
}

/** c in m/s (BIPM SI Brochure, 9th edition: exact). */
const C = 299792458;
/** Words of a limit said before a figure in its sentence ("at most", "the ideal", "would be limited to"). */
const LIMIT_BEFORE_RE =
  /(?<!\p{L})(?:the most|at most|at best|no more than|limit(?:ed)?|bound|maximum|ceiling|ideal|perfect|expected|predicts?|would (?:be|give|get|allow)|could (?:only )?(?:give|get|produce)|can only|allows?|P\/c|1\/c|light|photons?)(?!\p{L})/iu;

/** Words of light, the thing a sealed device's bound is about ("a torch", "a perfect photon thruster", "P/c"). */
const PHOTON_WORDS_RE = /(?<!\p{L})(?:light|photons?|photonic|torch|searchlight|lamp|laser|beam|radiation|radiates?|P\/c)(?!\p{L})/iu;
/** Words of a bound as such (not of light alone: "our photon thruster produced …" is a claim). */
const BOUND_WORDS_RE = /(?<!\p{L})(?:the most|at most|at best|no more than|limit|bound|maximum|ceiling|ideal|perfect(?:ly)?|can only|P\/c)(?!\p{L})/iu;
/** Before a force in its sentence: an instrument's resolution, sensitivity or calibration. */
const INSTRUMENT_BEFORE_RE =
  /(?<!\p{L})(?:resolution|resolve[sd]?|resolving|sensitivity|noise floor|detection (?:limit|threshold)|calibrat\w*|(?:measurements?|forces?) down to)(?!\p{L})[^.;!?\n,]{0,40}$/iu;
/** Right after a force: "… resolution", "… calibration force". */
const INSTRUMENT_AFTER_RE = /^[^\S\n]*(?:\)[^\S\n]*)?(?:resolution|sensitivity|noise floor|calibration)(?!\p{L})/iu;

/** Words of a measured or claimed figure before it in its sentence ("the measured thrust … was 16 µN"). */
const MEASURED_BEFORE_RE = /(?<!\p{L})(?:measur\w*|recorded|observed|readings?|reported|claim\w*|achiev\w*|reach\w*|demonstrat\w*|obtained|we (?:got|saw|found))(?!\p{L})/iu;

/**
 * The photon bound worked out in the text ("10 kW of light can give at most 33.4 µN", "1/c newtons per
 * watt, about 3.3 µN per kW"): a thrust within 1 % of P/c for a power said in its sentence, or a thrust
 * per power within 1 % of 1/c (within 5 % when said as a limit), is set aside where the text gives another
 * thrust or thrust per power — that one is the claim.
 */
export function asideWorkedBounds(text: string, drafts: Draft[]): void {
  const sentenceStart = (at: number) => windowStart(text, at, 0, 400);
  const near = (x: number, y: number, within: number) => y > 0 && Math.abs(x / y - 1) <= within;
  const bound = (d: Draft): boolean => {
    const si = siOf(d);
    if (si === null || d.role === 'aside') return false;
    const said = LIMIT_BEFORE_RE.test(text.slice(sentenceStart(d.start), d.start));
    if (d.kind === 'thrust-per-power') return near(si, 1 / C, 0.01) || (said && near(si, 1 / C, 0.05));
    if (d.kind !== 'thrust' || MEASURED_BEFORE_RE.test(text.slice(sentenceStart(d.start), d.start))) return false;
    const from = sentenceStart(d.start);
    if (drafts.some((p) => p.kind === 'power' && p.role !== 'aside' && sentenceStart(p.start) === from && near(si, (siOf(p) ?? 0) / C, said ? 0.02 : 0.01))) return true;
    // ("Light carrying that much power would push with at most 3.34 µN", "at that drive power a light beam
    // pushes with about 0.3 micronewtons": the bound said as such, for a power the text gives elsewhere,
    // rounded as writers round.)
    const before = text.slice(from, d.start);
    // (Or said after it: "below the 1.7 µN that 500 W could give even as a perfect photon rocket".)
    const after = sentenceAround(text, d.start, d.end).slice(d.end - from);
    const boundSaid = (BOUND_WORDS_RE.test(before) && PHOTON_WORDS_RE.test(before)) || (BOUND_WORDS_RE.test(after) && PHOTON_WORDS_RE.test(after));
    return boundSaid && drafts.some((p) => p.kind === 'power' && p.role !== 'aside' && !p.derived && near(si, (siOf(p) ?? 0) / C, 0.12));
  };
  // "a torsion balance with 5 × 10⁻⁷ N resolution", "calibration used a 100 µN electrostatic force": the
  // instrument's reach or its calibration, no force of the device.
  const instrument = (d: Draft): boolean => d.kind === 'thrust' && d.role !== 'aside' && !d.derived && (INSTRUMENT_BEFORE_RE.test(text.slice(sentenceStart(d.start), d.start)) || INSTRUMENT_AFTER_RE.test(text.slice(d.end, d.end + 24)));
  const thrusts = drafts.filter((d) => (d.kind === 'thrust' || d.kind === 'thrust-per-power') && d.role !== 'aside');
  const bounds = thrusts.filter((d) => bound(d) || instrument(d));
  if (bounds.length > 0 && bounds.length < thrusts.length) for (const d of bounds) d.role = 'aside';
  // "for that thrust to sit at the photon limit, the device would need about 330 kW": the power the bound
  // asks for, worked backwards from the claimed thrust — no power of the device.
  const claimed = drafts.filter((d) => d.kind === 'thrust' && d.role !== 'aside');
  for (const p of drafts) {
    if (p.kind !== 'power' || p.role === 'aside' || p.derived) continue;
    const si = siOf(p);
    if (si === null || !claimed.some((t) => near(si, (siOf(t) ?? 0) * C, 0.02))) continue;
    if (WOULD_NEED_BEFORE_RE.test(text.slice(sentenceStart(p.start), p.start))) p.role = 'aside';
  }
}
/** Before a speed change worked out from the rocket equation: "that gives an ideal delta-v a bit over", "the theoretical Δv is". */
const IDEAL_DV_BEFORE_RE = /(?<!\p{L})(?:ideal|theoretical|rocket[- ]equation|on paper)(?:[^\S\n]+(?:delta-?v|Δv|Δ-v|speed change|velocity change))?[^.;!?\n]{0,30}$/iu;

/**
 * "That gives an ideal delta-v a bit over 640 m/s … the altimeter showed 210 m/s": a speed change worked
 * out from the rocket equation, beside one the text states as the claim's or the flight's, is the
 * writer's bound, set aside.
 */
export function asideIdealDeltaV(text: string, drafts: Draft[]): void {
  const dvs = drafts.filter((d) => d.kind === 'speed' && d.role === 'delta-v');
  // (Not one the text calls the claim: "Claimed ideal burnout Δv, 2.8 km/s".)
  const ideal = dvs.filter((d) => IDEAL_DV_BEFORE_RE.test(text.slice(Math.max(0, d.start - 60), d.start)) && !/(?<!\p{L})claim(?:s|ed)?(?!\p{L})/iu.test(text.slice(Math.max(0, d.start - 60), d.start)));
  if (ideal.length > 0 && ideal.length < dvs.length) for (const d of ideal) d.role = 'aside';
}

/** Words of a power supposed, before it in its sentence ("would need about 330 kW"; not a plain "needs", which may be the claim). */
const WOULD_NEED_BEFORE_RE = /(?<!\p{L})(?:would|could|should|must|might|limit|ceiling|bound)(?!\p{L})/iu;

/** Words of a speed above c that carries nothing: an apparent motion, a phase, a recession, a spot or shadow. */
const APPARENT_SPEED_RE =
  /(?<!\p{L})(?:apparent(?:ly)?[^\S\n]+(?:speed|velocity|motion|movement)|(?:appear|seem)(?:s|ed)?[^\S\n]+to[^\S\n]+(?:have[^\S\n]+)?(?:move|moved|travel|travelled|traveled|go|gone|outrun|race|raced|sweep|swept|shoot|shot|cross|crossed|jump|jumped)|looks? (?:like|as if) it|(?:phase|group)[- ](?:velocit\w*|speed)|reced\w*|recession|expansion|expanding|spot|shadow|superluminal motion)(?!\p{L})/iu;

/**
 * "A knot in the jet appears to move at four times the speed of light", "the spot sweeps across the Moon
 * faster than light", "galaxies receding faster than light": a speed above c said as an appearance, a
 * phase or a recession carries no object or signal past c, and is set aside (no finding on it).
 */
/** A message or a signal said to be sent: "to send a message", "transmits data", "signalling". */
const SIGNAL_SENT_RE = /(?<!\p{L})(?:send(?:s|ing)?|sent|transmit\w*|signall?(?:ing|ed)|communicat\w*|carr(?:y|ies|ied|ying))(?!\p{L})[^.!?]{0,40}(?:messages?|signals?|information|data|bits?|news|pulses?)(?!\p{L})/iu;
/** A pulse timed from one end to the other: "station B timestamps arrival", "time of flight", "distance divided by mean delay". */
const PULSE_TIMED_RE = /(?<!\p{L})(?:timestamps?|time[- ]stamp\w*|time[- ]of[- ]flight|arrival[^\S\n]+times?|timestamps[^\S\n]+arrival|divided[^\S\n]+by[^\S\n]+(?:the[^\S\n]+)?(?:mean[^\S\n]+)?delay)(?!\p{L})/iu;
/** Said to carry nothing: "carries no information faster than light", "no signal travels faster". */
const NO_SIGNAL_RE = /(?<!\p{L})(?:carr(?:y|ies|ied|ying)|sends?|transmits?)[^\S\n]+no[^\S\n]+(?:information|signals?|messages?|data|energy)|no[^\S\n]+(?:information|signal|message)[^\S\n]+(?:is[^\S\n]+)?(?:sent|carried|travels?|moves?|goes)/iu;

export function asideApparentSpeeds(text: string, drafts: Draft[]): void {
  const apparent: number[] = [];
  for (const d of drafts) {
    const si = siOf(d) ?? 0;
    if (d.kind !== 'speed' || d.role === 'aside' || si <= C) continue;
    // (Said before it in its sentence, or in the sentence right after: "… at about 1.4 times the speed of
    // light. This is the phase velocity".)
    const next = /^[^.!?\n]*[.!?]["”’')\]]*[^\S\n]+([^.!?\n]{0,120})/u.exec(text.slice(d.end))?.[1] ?? '';
    // (A group velocity the text says carries a message or a signal is the claim itself: "used it to send a message faster than light".)
    const lead = text.slice(windowStart(text, d.start, 0, 400), d.start);
    const signalled = /(?<!\p{L})group[- ](?:velocit|speed)/iu.test(lead) && (SIGNAL_SENT_RE.test(text) || PULSE_TIMED_RE.test(text)) && !NO_SIGNAL_RE.test(text);
    if ((APPARENT_SPEED_RE.test(lead) && !signalled) || /^(?:this|that|it|the (?:crest|pattern|spot|knot|blob))[^.!?\n]{0,40}(?:phase (?:velocit|speed)|apparent|illusion|not real|no real)/iu.test(next)) {
      d.role = 'aside';
      apparent.push(si);
    }
  }
  // "well under a ten-thousandth of the speed of light": a bound the speed is said to keep under, where the
  // text states the speed itself ("40,000 mph").
  const plainSpeeds = drafts.filter((d) => d.kind === 'speed' && d.role !== 'aside' && !UNDER_BEFORE_RE.test(text.slice(Math.max(0, d.start - 30), d.start)));
  for (const d of drafts) {
    if (d.kind !== 'speed' || d.role === 'aside' || !UNDER_BEFORE_RE.test(text.slice(Math.max(0, d.start - 30), d.start))) continue;
    const ofLight = /^[^\S\n]*(?:of[^\S\n]+)?(?:the[^\S\n]+)?(?:speed|velocity)[^\S\n]+of[^\S\n]+light/iu.test(text.slice(d.end, d.end + 30)) || /(?:speed|velocity) of light|c$/iu.test(text.slice(d.start, d.end));
    if (ofLight && plainSpeeds.some((o) => o !== d)) d.role = 'aside';
  }
  // The same speed said elsewhere ("Quasar jet caught moving at four and a half times the speed of light"
  // in a headline, "appears to move sideways at 4.5 c" below) is the same appearance.
  for (const d of drafts) {
    const si = siOf(d) ?? 0;
    if (d.kind === 'speed' && d.role !== 'aside' && apparent.some((a) => Math.abs(si / a - 1) <= 0.001)) d.role = 'aside';
  }
}

/** Words of a bound a speed keeps under, right before it ("well under a", "less than", "below"). */
const UNDER_BEFORE_RE = /(?<!\p{L})(?:(?:well|far|way|just|still)[^\S\n]+)?(?:under|below|less than|short of|no more than|not even)[^\S\n]+(?:(?:a|an|the)[^\S\n]+)?$/iu;

/** Words of a signal that an amplifier steers, not a supply it draws from. */
const SIGNAL_NEAR_RE = /(?<!\p{L})(?:signals?|preamp\w*|drive level|input level)(?!\p{L})/iu;
/** Words of a supply a device draws from: the mains, a wall socket, a supply or a battery. */
const SUPPLY_NEAR_RE = /(?<!\p{L})(?:mains|wall|socket|outlet|supply|supplies|grid|draws?|drew|drawing|consum\w*|battery|batteries)(?!\p{L})/iu;

/**
 * "turns the 1 W signal from my preamp into 100 W at the speakers … it draws 180 W from the mains": where
 * the text states what the device draws from a supply, a signal it amplifies is no input of its energy.
 */
export function asideSignals(text: string, drafts: Draft[]): void {
  const around = (d: Draft) => text.slice(Math.max(0, d.start - 40), Math.min(text.length, d.end + 30));
  const inputs = drafts.filter((d) => (d.kind === 'power' || d.kind === 'energy') && d.role === 'in' && !d.derived);
  const signals = inputs.filter((d) => SIGNAL_NEAR_RE.test(around(d)));
  if (signals.length === 0 || !inputs.some((d) => !signals.includes(d) && SUPPLY_NEAR_RE.test(around(d)))) return;
  for (const d of signals) d.role = 'aside';
}

/** A line's label of an input or an output: "P_in (electrolysis, logged) = 40 ± 0.5 W", "E_out: 12 kWh". */
const LINE_LABEL_RE = /^[^\S\n]*[-•*]?[^\S\n]*(?:P|E|W|Q̇|Q)_?\{?(in|out)\}?(?![\p{L}\d])[^=:\n]{0,50}?[=:]/imu;

/**
 * A figure of power or energy on a line that opens with an input or output label takes that label's side,
 * whatever word the label's note in brackets holds ("(electrolysis, logged)" is no "logged" output).
 */
export function rolesFromLineLabels(text: string, drafts: Draft[]): void {
  let at = 0;
  for (const line of text.split('\n')) {
    const m = LINE_LABEL_RE.exec(line);
    if (m) {
      const from = at + m[0].length;
      // (The label's own figure: the first read after it, if it is a power or an energy — "P_in = 48 V × 10 A;
      // P_out = 520 W" gives its input as a voltage and a current.)
      const first = drafts.find((d) => d.start >= from && d.start < at + line.length && !d.derived);
      if (first && (first.kind === 'power' || first.kind === 'energy') && first.role !== 'aside') first.role = m[1].toLowerCase() === 'in' ? 'in' : 'out';
    }
    at += line.length + 1;
  }
}

/** A sentence led by a word label: "Input: 2.1 A at 12 V from the battery.", "Output: the lamp bank runs at 48 V and pulls 0.9 A." */
const SENTENCE_LABEL_RE = /(?:^|[.!?][^\S\n]+|\n)[^\S\n]*[-•*]?[^\S\n]*(input|output)(?:[^\S\n]+(?:power|side|energy))?[^\S\n]*:/giu;
/** A label before a worked product: "input 48 V × 5.2 A = 249.6 W". */
const PRODUCT_LABEL_RE =
  /(?<!\p{L})(input|output|in|out)(?:[^\S\n]+(?:power|side))?[^\S\n]*[:=]?[^\S\n]*(?=[\d.,]+[^\S\n]*(?:V|A|volts?|amps?)[^\S\n]*[×x*·][^\S\n]*[\d.,]+[^\S\n]*(?:V|A|volts?|amps?)[^\S\n]*=[^\S\n]*[\d.,]+[^\S\n]*[kMm]?W(?![\p{L}]))/giu;

/**
 * Word labels the writer puts on a side: a sentence that starts "Output:" is about what comes out, whatever
 * verb its load takes ("Output: the lamp bank runs at 48 V and pulls 0.9 A"); a worked product after
 * "input" or "output" ("input 48 V × 5.2 A = 249.6 W, output 12 V × 19 A = 228 W") is that side's power.
 */
export function rolesFromWordLabels(text: string, drafts: Draft[]): void {
  const side = (w: string) => (/^in/iu.test(w) ? 'in' : 'out') as 'in' | 'out';
  for (const m of text.matchAll(SENTENCE_LABEL_RE)) {
    const from = m.index! + m[0].length;
    const stop = /[.!?](?:[^\S\n]|$)|\n/u.exec(text.slice(from));
    const to = stop ? from + stop.index : text.length;
    const own = drafts.filter((d) => (d.kind === 'power' || d.kind === 'energy') && d.role !== 'aside' && d.start >= from && d.end <= to + 1);
    const values = new Set(own.map((d) => siOf(d)));
    if (own.length > 0 && values.size === 1) for (const d of own) d.role = side(m[1]);
  }
  for (const m of text.matchAll(PRODUCT_LABEL_RE)) {
    const from = m.index! + m[0].length;
    const eq = text.indexOf('=', from);
    const result = drafts.find((d) => d.kind === 'power' && d.start > eq && d.start - eq < 6);
    if (!result || result.role === 'aside') continue;
    const v = siOf(result);
    for (const d of drafts) if (d.kind === 'power' && d.start >= from && d.end <= result.end && siOf(d) === v) d.role = side(m[1]);
  }
}

/**
 * "OVER 100% EFFICIENT SOLAR???", "efficiency above 100 % was the classic sign of a perpetual motion claim":
 * 100 % said as a threshold passed is no figure of the device — how far past it is not said — and is set
 * aside, so that a check is run on the figures the text does give (the cell's 18.5 %).
 */
export function asideThresholds(drafts: Draft[]): void {
  for (const d of drafts) {
    if ((d.kind === 'efficiency' || d.kind === 'quantum-efficiency') && d.role !== 'aside' && d.hedge === 'more-than' && Math.abs((siOf(d) ?? 0) - 1) < 1e-9) d.role = 'aside';
  }
}
