/**
 * The checks whose figures claims seldom give (shared/claims/plan.ts): the limits of converters of
 * sunlight (Landsberg, Carnot, Shockley–Queisser for one junction), Faraday's law for electrolysers,
 * the energy per atom of metal–hydrogen cells, the road load of a vehicle said to charge itself,
 * Landauer's bound per bit; each run when the text gives its figures, else what it needs. And a
 * quantum efficiency above 1, noted.
 */
import { formatPrint } from '../print';
import { at, need, ofKind, uniq, type Basis } from './basis';
import { sentenceAround } from '../reader/context';
import { HEAT_ONLY_RE } from './signals';

/** A converter of sunlight to electricity. */
const SOLAR_CELL_RE = /(?<!\p{L})(?:solar (?:cells?|panels?|modules?|films?|arrays?)|(?:rooftop|roof-?top|home|residential) solar|solar(?:[^\S\n]+[\p{L}-]+){0,3}[^\S\n]*[,:;–—-][^\S\n]*(?:the[^\S\n]+)?(?:panels?|modules?)|PV (?:panels?|modules?|arrays?)|photovoltaic\w*|PV|perovskites?|(?:silicon|GaAs|gallium arsenide|CdTe|CIGS|organic)(?:[^\S\n]+[\p{L}-]+){0,2}?[^\S\n]+(?:cells?|films?|modules?)|hetero-?junction cells?|(?:one|1)[- ]sun|AM[^\S\n]?1\.5G?|single[- ]junction|multi[- ]junction|triple[- ]junction|tandem cells?|(?:mono|poly)-?(?:c-)?Si|c-Si|a-Si|(?:mono|poly|multi)-?crystalline(?:[^\S\n]+silicon)?|(?:panels?|modules?)(?=[^.;!?\n]{0,60}(?<!\p{L})(?:in|under)[^\S\n]+(?:full|peak|direct|bright|strong|midday|noon|standard)[^\S\n]+(?:sun|sunlight|sunshine)(?!\p{L}))|(?:of|from) (?:plain |the )?sunlight (?:in)?to electricity)(?!\p{L})/iu;
/** "single-junction", "triple-junction", "a 4-junction cell". */
const JUNCTIONS_RE = /(?<!\p{L})(single|one|double|dual|two|triple|three|four|five|six|\d{1,2})[- ]junction(?!\p{L})|(?<!\p{L})(tandem)(?!\p{L})/iu;
/** A plain crystalline-silicon cell, one junction (not a tandem that stacks another cell on silicon). */
const SILICON_CELL_RE = /(?<!\p{L})(?:(?:mono|poly|multi)-?crystalline(?:[^\S\n]+silicon)?|(?:mono|poly)-?(?:c-)?Si|c-Si|(?:crystalline[^\S\n]+)?silicon[^\S\n]+(?:solar[^\S\n]+)?(?:cells?|panels?|modules?|wafers?))(?!\p{L})/iu;
const STACKED_CELL_RE = /(?<!\p{L})(?:tandem|multi[- ]?junction|triple[- ]junction|double[- ]junction|dual[- ]junction|perovskites?|stacked|III-V|GaAs|gallium|InGaP|germanium|(?:2|3|4|two|three|four)[- ]junction)(?!\p{L})/iu;
const JUNCTION_COUNT: Record<string, number> = { single: 1, one: 1, double: 2, dual: 2, two: 2, tandem: 2, triple: 3, three: 3, four: 4, five: 5, six: 6 };
/** "under 500 suns", "at 1,000× concentration". */
const SUNS_RE = /(\d[\d,]*(?:\.\d+)?)[^\S\n]*(?:suns|×[^\S\n]*concentrat\w*|x[^\S\n]+concentrat\w*|-sun(?!\p{L}))/iu;
const ONE_SUN_RE = /(?<!\p{L})(?:one sun|1 sun|unconcentrated|no concentrators?|non-concentrat\w*|plain sunlight|AM ?1\.5|standard test conditions|STC)(?!\p{L})/iu;
/** The most concentrated sunlight (the sun filling the whole sky), as the light-converter check takes it. */
const MAX_SUNS = 46200;
/** Splitting water by a current. */
const ELECTROLYSIS_RE = /(?<!\p{L})(?:electroly[sz]\w*|HHO|oxyhydrogen|Brown'?s gas|hydroxy gas|hydrogen-on-demand|water cells?|water-splitting)(?!\p{L})/iu;
/** "a 6-cell stack", "eight cells in series", "a single cell". */
const CELLS_RE = /(?<!\p{L})(\d{1,3}|single|one|two|three|four|five|six|seven|eight|nine|ten|twelve)[- ](?:cells?|plates? pairs?)(?!\p{L})(?:[^.;!?\n]{0,20}in series)?/iu;
const CELL_WORDS: Record<string, number> = { single: 1, one: 1, two: 2, three: 3, four: 4, five: 5, six: 6, seven: 7, eight: 8, nine: 9, ten: 10, twelve: 12 };
/** The flow is hydrogen alone (a cell that separates the gases). */
const HYDROGEN_ONLY_RE = /(?<!\p{L})(?:of (?:pure |separated )?hydrogen(?! and)|hydrogen only|H2 only|hydrogen alone)(?!\p{L})/iu;
/** Cells of hydrogen or deuterium in a metal. */
const EXCESS_HEAT_CELL_RE = /(?<!\p{L})(?:palladium|deuterium|deuteride|LENR|cold fusion|low-energy nuclear|nickel[–-]hydrogen|metal hydrides?|heavy water|loaded with (?:hydrogen|deuterium)|lattice-assisted|lattice[- ]enabled)(?!\p{L})/iu;
/** The metals of metal–hydrogen cells, and their standard atomic weights (IUPAC, CIAAW 2021). */
const METAL_RE = /(?<!\p{L})(palladium|nickel|titanium|lithium)(?!\p{L})/iu;
const MOLAR_MASS: Record<string, number> = { palladium: 106.42, nickel: 58.6934, titanium: 47.867, lithium: 6.94 };
/** A vehicle said to charge itself. */
const SELF_CHARGING_VEHICLE_RE = /(?<!\p{L})(?:self-?(?:re)?charging|charges? (?:it|them)sel(?:f|ves)|never needs? (?:to be )?(?:charging|charged|plugging in)|infinite range|unlimited range)(?!\p{L})[^.;!?\n]{0,80}(?<!\p{L})(?:cars?|vehicles?|EVs?|trucks?|lorr(?:y|ies)|bus(?:es)?|scooters?|bikes?|sedans?|saloons?|hatchbacks?|SUVs?|vans?)(?!\p{L})|(?<!\p{L})(?:cars?|vehicles?|EVs?|trucks?|bus(?:es)?|scooters?|sedans?|saloons?|hatchbacks?|SUVs?|vans?)(?!\p{L})[^.;!?\n]{0,80}(?<!\p{L})(?:self-?(?:re)?charging|charges? itself|recharges? itself|never needs? (?:to be )?(?:charging|charged|plugging in)|infinite range|unlimited range)(?!\p{L})/iu;
/** "Each switching event in the chip dissipates 1e-18 J": the operation named before the energy. */
const PER_BIT_BEFORE_RE = /(?<!\p{L})(?:each|every|per|a single|one)[^\S\n]+(?:erased[^\S\n]+|logical[^\S\n]+|logic[^\S\n]+)?(?:bit|operation|erasure|switching event|switch|gate operation|logic operation|flip)(?:[^\S\n]+(?:erasure|flip))?(?!\p{L})[^.;!?\n]{0,70}$/iu;
/** "… J per bit", "for each bit erased", "per logic operation". */
const PER_BIT_RE = /^[^\S\n]*(?:(?:of energy|of work)[^\S\n]+)?(?:per|for each|for every|each|a)[^\S\n]+(?:erased[^\S\n]+|logical[^\S\n]+|logic[^\S\n]+)?(?:bit|bits|operation|erasure|switching event|gate operation|flip)(?!\p{L})/iu;

/** A limit of light converters named: "beats the Shockley–Queisser limit", "above the detailed-balance limit". */
const LIGHT_LIMIT_NAMED_RE = /(?<!\p{L})(?:Shockley[–-]Queisser|SQ limit|detailed[- ]balance limit|Landsberg limit)(?!\p{L})/iu;

/** Converters of electricity to electricity: their efficiency is no light converter's. */
const ELECTRICAL_CONVERTER_RE =
  /(?<!\p{L})(?:buck|boost|buck-boost|DC[- ]?(?:to[- ])?DC|switching (?:regulators?|converters?|supply|supplies)|(?:voltage |linear )?regulators?|inverters?|micro-?inverters?|charge controllers?|MPPT|chargers?|power processing units?|PPUs?|power conditioning (?:units?|electronics)|(?:motor |LED )?(?:controllers?|drivers?)|ballasts?|power suppl(?:y|ies)|transformers?|(?:power|voltage|electronic) converters?|converters? (?:for|on|behind|after) (?:the |a |small |its )?(?:solar |PV )?(?:panels?|modules?|arrays?))(?!\p{L})/iu;

/** Up to 300 characters before a figure and 200 after, within its paragraph (a blank line ends one). */
function paragraphNear(text: string, start: number, end: number): string {
  const before = text.slice(Math.max(0, start - 300), start).split(/\n[^\S\n]*\n/).pop() ?? '';
  const after = text.slice(end, end + 200).split(/\n[^\S\n]*\n/)[0];
  return before + text.slice(start, end) + after;
}

export function planOtherChecks(b: Basis): void {
  const { figures, ctx, s, plans, needs, notes, power, energy, text, pIn, pOut, speeds, temps } = b;
  // ---- Converters of sunlight: the Landsberg and Carnot bounds, and Shockley–Queisser for one junction
  const solarEfficiency = ofKind(figures, 'efficiency').find((f) => !f.derived);
  // (A heat-only device in the efficiency's own sentence, not a furnace named elsewhere in a long report.)
  const heatOnly = solarEfficiency && solarEfficiency.start !== null && solarEfficiency.end !== null ? HEAT_ONLY_RE.test(sentenceAround(text, solarEfficiency.start, solarEfficiency.end)) : HEAT_ONLY_RE.test(text);
  // (The cell named near the efficiency, in its paragraph: a report that mentions photovoltaics in
  // passing gives no cell's efficiency.)
  const nearEfficiency = solarEfficiency && solarEfficiency.start !== null && solarEfficiency.end !== null ? paragraphNear(text, solarEfficiency.start, solarEfficiency.end) : text;
  // (Nor the efficiency of an electrical converter the text names with the panel: "a 94 %-efficient
  // converter for small solar panels", an inverter's or a charge controller's: electricity in,
  // electricity out, a first-law matter.)
  const ofElectricalConverter =
    solarEfficiency && solarEfficiency.start !== null && solarEfficiency.end !== null && ELECTRICAL_CONVERTER_RE.test(sentenceAround(text, solarEfficiency.start, solarEfficiency.end));
  if (solarEfficiency && SOLAR_CELL_RE.test(nearEfficiency) && !s.heatEngine && !heatOnly && !ofElectricalConverter) {
    const junction = JUNCTIONS_RE.exec(text);
    const silicon = !junction && SILICON_CELL_RE.test(text) && !STACKED_CELL_RE.test(text);
    const junctions = junction ? (JUNCTION_COUNT[(junction[1] ?? junction[2]).toLowerCase()] ?? Number(junction[1])) : silicon ? 1 : 0;
    const suns = SUNS_RE.exec(text);
    const oneSun = ONE_SUN_RE.test(text);
    const X = suns ? Math.min(Number(suns[1].replace(',', '')), MAX_SUNS) : oneSun ? 1 : MAX_SUNS;
    const extra: string[] = ['The sun as a 6000 K blackbody and the cell at 300 K, as Shockley and Queisser took them.'];
    if (silicon) extra.push('A crystalline-silicon cell, as the text describes it, has one junction.');
    else if (!junction) extra.push('The text does not say how many junctions the cell has: only the Landsberg and Carnot bounds, which hold for any converter, are applied.');
    if (!suns && !oneSun) extra.push('The text does not say how concentrated the sunlight is: the most concentrated (the sun filling the whole sky), the end most favourable to the claim.');
    plans.push({
      check: 'light-converter-limits',
      uses: [solarEfficiency],
      inputs: (e) => ({ eta_claimed: at(solarEfficiency, e(solarEfficiency)), junctions: String(junctions), X: String(X) }),
      why: 'The text gives the efficiency of a converter of sunlight.',
      assumptions: extra,
    });
  }

  // "Our cell breaks the Shockley–Queisser limit … it quotes no efficiency": the limit is named, the
  // efficiency is not given.
  if (!solarEfficiency && LIGHT_LIMIT_NAMED_RE.test(text) && !s.heatEngine) {
    needs.push(need('light-converter-limits', ['the efficiency of the cell, measured (and under how many suns)'], 'A converter of sunlight is bounded by the Landsberg and Carnot limits, and one junction by Shockley–Queisser.', []));
  }

  // ---- Checks whose figures claims seldom give: say what they need
  const flows = [...power, ...energy];
  const gasFlow = ofKind(figures, 'gas-flow')[0];
  const current = ofKind(figures, 'current')[0];
  const cellCount = CELLS_RE.exec(text);
  const cellsIn = cellCount ? (CELL_WORDS[cellCount[1].toLowerCase()] ?? Number(cellCount[1])) : undefined;
  if (gasFlow && (current || pIn) && cellsIn && cellsIn > 0) {
    // Faraday's law: at most N·I/(2F) moles of hydrogen a second, 1.5 times that of mixed gas.
    const drive = current ?? pIn!;
    plans.push({
      check: 'faraday-yield',
      uses: uniq([gasFlow, drive]),
      inputs: (e) => ({
        I: current ? at(current, e(current)) : '0 A',
        P: current ? '0 W' : at(pIn!, e(pIn!)),
        cells: String(cellsIn),
        gas: HYDROGEN_ONLY_RE.test(text) ? '1' : '1.5',
        flow_claimed: at(gasFlow, e(gasFlow)),
      }),
      why: 'The text gives a gas flow from an electrolyser and the current (or power) that drives it.',
      assumptions: [
        'The gas volume is read at 25 °C and one standard atmosphere (101.325 kPa): the text does not say where it was measured.',
        ...(HYDROGEN_ONLY_RE.test(text) ? [] : ['The gas is counted as the oxyhydrogen mixture (1.5 times the hydrogen), the reading most favourable to the claim.']),
      ],
    });
  } else if (ELECTROLYSIS_RE.test(text) && (current || gasFlow || flows.length)) {
    needs.push(
      need(
        'faraday-yield',
        [
          ...(gasFlow ? [] : ['the gas flow measured (litres per minute, at a stated temperature and pressure)']),
          ...(current || pIn ? [] : ['the current through the cells (or the power drawn)']),
          ...(cellsIn ? [] : ['how many cells are in series']),
        ],
        "Faraday's law sets the most gas a current can split from water: a claimed flow above it was not made by electrolysis.",
        uniq([gasFlow, current, pIn]),
      ),
    );
  }
  const excessHeat = (ctx.classes ?? []).includes('excess-heat-cell') || EXCESS_HEAT_CELL_RE.test(text);
  const metal = METAL_RE.exec(text);
  const energies = ofKind(figures, 'energy');
  const excessEnergy = energies.find((f) => f.role === 'excess') ?? energies.find((f) => f.role === 'out') ?? energies.find((f) => f.role === null);
  const metalMass = ofKind(figures, 'mass')[0];
  // With an energy in and an energy out (and no excess said), the excess is out − in, taken at its
  // smallest (the low end of out, the high end of in): none at all means no nuclear question.
  const energyIn = energies.find((f) => f.role === 'in');
  const outLessIn = excessEnergy?.role === 'out' && energyIn ? excessEnergy.si - (energyIn.upper?.si ?? energyIn.si) : null;
  if (excessHeat && metal && excessEnergy && metalMass && outLessIn !== null && outLessIn > 0 && energyIn) {
    const molar = MOLAR_MASS[metal[1].toLowerCase()];
    plans.push({
      check: 'nuclear-signature',
      uses: [excessEnergy, energyIn, metalMass],
      inputs: (e) => ({ E_excess: `${outLessIn} J`, mass: at(metalMass, e(metalMass)), molar_mass: `${molar} g/mol`, atoms: '0', P_excess: '0 W' }),
      why: `The text gives the energy out and in, and the mass of ${metal[1].toLowerCase()} the excess came from.`,
      assumptions: [
        'The excess is the energy out less the energy in, at its smallest.',
        `Every atom of the ${formatPrint(metalMass.si * 1000)} g of ${metal[1].toLowerCase()} (${molar} g/mol, IUPAC standard atomic weight) takes part, the reading most favourable to the claim.`,
      ],
    });
  } else if (excessHeat && metal && excessEnergy && metalMass && outLessIn === null) {
    // The claimed energy per atom of the named metal, against the few electronvolts chemistry gives.
    const molar = MOLAR_MASS[metal[1].toLowerCase()];
    plans.push({
      check: 'nuclear-signature',
      uses: [excessEnergy, metalMass],
      inputs: (e) => ({ E_excess: at(excessEnergy, e(excessEnergy)), mass: at(metalMass, e(metalMass)), molar_mass: `${molar} g/mol`, atoms: '0', P_excess: '0 W' }),
      why: `The text gives the excess energy and the mass of ${metal[1].toLowerCase()} it came from.`,
      assumptions: [`Every atom of the ${formatPrint(metalMass.si * 1000)} g of ${metal[1].toLowerCase()} (${molar} g/mol, IUPAC standard atomic weight) takes part, the reading most favourable to the claim.`],
    });
  } else if (excessHeat && flows.length) {
    needs.push(
      need(
        'nuclear-signature',
        ['the reaction proposed (its energy per reaction)', 'the mass of metal and hydrogen taking part'],
        'Chemistry gives a few electronvolts per atom; more needs nuclear reactions, whose rate and radiation follow from the power claimed.',
        uniq(flows.filter((f) => f.role === 'excess' || f.role === 'out')),
      ),
    );
  }
  if ((ctx.classes ?? []).includes('self-charging-loop') || SELF_CHARGING_VEHICLE_RE.test(text)) {
    needs.push(
      need(
        'road-load',
        ["the vehicle's mass and speed", 'its drag coefficient and frontal area', "the generator's power"],
        'A generator driven by the vehicle adds at least its power over the speed to the drag the motor must overcome.',
        uniq([pOut, pIn, ...speeds]),
      ),
    );
  }
  const perBit = ofKind(figures, 'energy').find((f) => PER_BIT_RE.test(text.slice(f.end ?? 0, (f.end ?? 0) + 40)) || PER_BIT_BEFORE_RE.test(text.slice(Math.max(0, (f.start ?? 0) - 90), f.start ?? 0)));
  if (perBit) {
    const temp = temps.length === 1 ? temps[0] : undefined;
    if (temp) {
      plans.push({
        check: 'landauer',
        uses: [perBit, temp],
        inputs: (e) => ({ T: at(temp, e(temp)), E_op: at(perBit, e(perBit)), bits: '1' }),
        why: 'The text gives the energy of one operation on a bit and the temperature it works at.',
        assumptions: ['One bit erased per operation.'],
      });
    } else {
      needs.push(need('landauer', ['the temperature at which it works'], "Erasing a bit costs at least k_B·T·ln 2 (Landauer's bound).", [perBit]));
    }
  }

  // ---- Quantum efficiency
  const qe = ofKind(figures, 'quantum-efficiency').find((f) => (f.upper?.si ?? f.si) > 1);
  if (qe) {
    notes.push(
      `A quantum efficiency of ${qe.display.trim() || formatPrint(qe.si)} counts particles (photons per electron, or electrons per photon), not energy: above 1 it is not by itself a claim of more energy out than in (carrier multiplication and similar effects give it lawfully). The energy balance needs the power in and the power out.`,
    );
  }
}
