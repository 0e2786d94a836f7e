import { CAUTION_LASER } from './cautions';
import { E_CHARGE, K_BOLTZMANN, SUN_DILUTION } from './constants';
import { CheckRangeError } from './errors';
import { fmt, fmtQ } from './format';
import { bestBandGap, carnotEfficiency, landsbergEfficiency, photonConversionBound, shockleyQueisserEfficiency } from './formulas';
import { readInputs } from './inputs';
import { constantSeries, linspace, mapSeries } from './series';
import type { CheckDefinition, CheckInputSpec, CheckOutput, CheckPlot } from './types';

const eV = E_CHARGE;
/** Below this a band gap is refused (0 asks for the best one): the limit there is near zero anyway. */
const EG_SMALLEST = 0.05 * eV;
/** The largest concentration of sunlight: the sun then fills the converter's whole view. */
export const MAX_CONCENTRATION = Math.floor(1 / SUN_DILUTION);

const inputs: CheckInputSpec[] = [
  {
    name: 'eta_claimed',
    label: 'Claimed power-conversion efficiency',
    unit: '',
    default: '0.45',
    min: 0,
    max: 100,
    help: 'Electrical power out over the light power in, as a fraction (0.45 for 45 %).',
  },
  {
    name: 'junctions',
    label: 'Junctions (1 = a single-junction cell; 0 = any converter or not said)',
    unit: '',
    default: '1',
    min: 0,
    max: 1000,
    integer: true,
    help: 'The Shockley–Queisser limit holds for one junction; stacks of several junctions and other converters answer only to the Landsberg and Carnot bounds.',
  },
  {
    name: 'Eg',
    label: 'Band gap of the cell (0 = the best one)',
    unit: 'J',
    displayUnit: 'eV',
    default: '0 eV',
    min: 0,
    max: 10 * eV,
    help: 'e.g. about 1.12 eV for silicon, 1.42 eV for gallium arsenide (common practice, no source); 0 gives the limit at the best band gap.',
  },
  {
    name: 'Ts',
    label: 'Temperature of the sun as a blackbody',
    unit: 'K',
    default: '6000 K',
    min: 100,
    max: 1e5,
    help: 'Shockley and Queisser (1961) took 6000 K; the IAU nominal effective temperature of the sun is 5772 K (IAU 2015 Resolution B3).',
    presets: [
      { label: '6000 K (Shockley and Queisser 1961)', value: '6000 K' },
      { label: '5772 K (IAU nominal solar value)', value: '5772 K' },
    ],
  },
  { name: 'Ta', label: 'Temperature of the converter and its surroundings', unit: 'K', default: '300 K', min: 1, max: 1e4 },
  {
    name: 'X',
    label: 'Concentration of the sunlight (suns)',
    unit: '',
    default: '1',
    min: 1,
    max: MAX_CONCENTRATION,
    help: `1 for plain sunlight; at most about ${MAX_CONCENTRATION}, where the sun fills the converter's whole view.`,
  },
  {
    name: 'E_photon',
    label: 'Photon energy of monochromatic light (0 = sunlight)',
    unit: 'J',
    displayUnit: 'eV',
    default: '0 eV',
    min: 0,
    max: 1e4 * eV,
    help: 'For a converter of laser or LED light of one colour, e.g. "1.55 eV" (800 nm) — then the bound is QE·qV/E_photon instead.',
  },
  {
    name: 'QE',
    label: 'Quantum efficiency: carriers per photon (monochromatic light)',
    unit: '',
    default: '1',
    min: 0,
    max: 100,
    help: 'Electrons delivered per photon; 1 for an ideal cell.',
  },
  {
    name: 'V',
    label: 'Operating voltage of the cell (monochromatic light; 0 = not stated)',
    unit: 'V',
    default: '0 V',
    min: 0,
    max: 1e4,
  },
];

const pct = (x: number) => `${fmt(100 * x)} %`;
/** A count as typed when whole ("1", "500"), else to three figures. */
const num = (x: number) => (Number.isInteger(x) && x < 1e6 ? String(x) : fmt(x));

/**
 * A claimed efficiency of a converter of light against the radiative limits: for sunlight taken as a
 * blackbody, the Carnot bound 1 − Ta/Ts, Landsberg's bound for any converter of blackbody radiation
 * and the Shockley–Queisser detailed-balance limit of a single junction; for monochromatic light,
 * η ≤ QE·qV/E_photon.
 */
export const lightConverterLimits: CheckDefinition = {
  name: 'light-converter-limits',
  title: 'Solar cells and light converters against their radiative limits',
  summary:
    'No converter of sunlight beats Carnot (1 − Ta/Ts) or, tighter, Landsberg\'s bound for blackbody radiation, ' +
    '1 − 4/3·(Ta/Ts) + 1/3·(Ta/Ts)⁴: about 93 % for a 6000 K sun and a 300 K converter. A single-junction cell is held to ' +
    'the Shockley–Queisser limit (detailed balance, 1961): about 31 % at one sun for a 6000 K blackbody sun, computed here ' +
    'for the stated band gap and concentration. Light of one photon energy E is converted at most with QE·qV/E. Use it for ' +
    'any claimed efficiency of a solar cell, a photovoltaic panel or a converter of laser light.',
  condition:
    'claimed efficiency ≤ Shockley–Queisser limit (one junction) or ≤ Landsberg bound (any converter) for sunlight; ≤ QE·qV/E_photon for light of one colour',
  inputs,
  cautions: [CAUTION_LASER],
  run(si) {
    const x = readInputs(inputs, si);
    const outputs: CheckOutput[] = [];
    const plots: CheckPlot[] = [];
    const claimed = x.eta_claimed;
    let bound: number;
    let message: string;

    if (x.E_photon > 0) {
      // Light of one colour: each photon gives at most QE carriers, each at most qV.
      const withV = x.V > 0;
      bound = withV ? photonConversionBound(x.QE, x.V, x.E_photon) : x.QE;
      outputs.push({ name: 'eta_mono_bound', label: withV ? 'Bound QE·qV/E_photon' : 'Bound QE (qV below the photon energy)', si: bound, unit: '' });
      const basis = withV
        ? `QE·qV/E_photon = ${fmt(x.QE)} × ${fmtQ(x.V, 'V')} / ${fmt(x.E_photon / eV)} eV = ${pct(bound)}`
        : `the quantum efficiency, ${fmt(x.QE)}, since a cell's voltage stays below the photon energy it absorbs (qV < E_photon)`;
      message =
        bound === 0
          ? `With ${x.QE === 0 ? 'a quantum efficiency of 0' : 'no voltage'} a converter of light of ${fmt(x.E_photon / eV)} eV photons gives no power; ` +
            `the claimed efficiency, ${pct(claimed)}, ${claimed > 0 ? 'is above that' : 'agrees'}.`
          : claimed <= bound
          ? `The claimed efficiency, ${pct(claimed)}, is within the bound for light of ${fmt(x.E_photon / eV)} eV photons: ${basis}.`
          : `The claimed efficiency, ${pct(claimed)}, is ${fmt(claimed / bound)} times the bound for light of ${fmt(x.E_photon / eV)} eV ` +
            `photons: ${basis}. Each photon can give at most its quantum efficiency's worth of carriers, each at most q·V of energy.`;
    } else {
      if (!(x.Ta < x.Ts)) throw new CheckRangeError('Ta', `The converter (${fmtQ(x.Ta, 'K')}) must be cooler than the sun (${fmtQ(x.Ts, 'K')}).`);
      if (x.Eg > 0 && x.Eg < EG_SMALLEST) throw new CheckRangeError('Eg', 'The band gap must be at least 0.05 eV (or 0 for the best one).');
      const eta_carnot = carnotEfficiency(x.Ts, x.Ta);
      const eta_landsberg = landsbergEfficiency(x.Ts, x.Ta);
      outputs.push(
        { name: 'eta_carnot', label: 'Carnot bound 1 − Ta/Ts', si: eta_carnot, unit: '' },
        { name: 'eta_landsberg', label: 'Landsberg bound 1 − 4/3·(Ta/Ts) + 1/3·(Ta/Ts)⁴', si: eta_landsberg, unit: '' },
      );
      const light = `sunlight as a ${fmtQ(x.Ts, 'K')} blackbody at ${num(x.X)} sun${x.X === 1 ? '' : 's'} and a converter at ${fmtQ(x.Ta, 'K')}`;
      const others = `Landsberg ${pct(eta_landsberg)}, Carnot ${pct(eta_carnot)}`;
      if (x.junctions === 1) {
        const best = x.Eg > 0 ? null : bestBandGap(x.Ts, x.Ta, x.X);
        const Eg = best ? best.Eg : x.Eg;
        const eta_sq = best ? best.eta : shockleyQueisserEfficiency(Eg, x.Ts, x.Ta, x.X);
        bound = eta_sq;
        outputs.push(
          { name: 'Eg_used', label: best ? 'Best band gap' : 'Band gap', si: Eg, unit: 'J', displayUnit: 'eV' },
          { name: 'eta_sq', label: 'Shockley–Queisser limit (one junction)', si: eta_sq, unit: '' },
        );
        const at = best ? `at the best band gap, ${fmt(Eg / eV)} eV` : `at a band gap of ${fmt(Eg / eV)} eV`;
        message =
          claimed <= bound
            ? `The claimed efficiency, ${pct(claimed)}, is within the Shockley–Queisser limit for a single-junction cell, ${pct(eta_sq)} ${at}, ` +
              `for ${light} (${fmt(claimed / bound)} of it; ${others}).`
            : `The claimed efficiency, ${pct(claimed)}, is ${fmt(claimed / bound)} times the Shockley–Queisser limit for a single-junction ` +
              `cell, ${pct(eta_sq)} ${at}, for ${light} (${others}). One junction cannot pass it: photons below the band gap pass ` +
              'unused, the energy of those above it beyond the gap turns to heat, and a working cell must emit light itself.';
        if (claimed > bound && claimed <= eta_landsberg) {
          message +=
            ' A stack of several junctions or another kind of converter could go higher, up to the Landsberg bound; a terrestrial ' +
            'spectrum instead of a blackbody moves the single-junction limit by a few points (about 33 % near 1.34 eV under the ' +
            'AM1.5G reference spectrum; common practice), so the spectrum and the number of junctions must be stated.';
        }
        const kTs = K_BOLTZMANN * x.Ts;
        const gaps = linspace(0.4 * kTs, 6 * kTs, 57);
        plots.push({
          kind: 'line',
          name: 'sq-vs-band-gap',
          title: `Shockley–Queisser limit against the band gap, ${light}`,
          x: { label: 'Band gap', unit: 'eV', values: mapSeries(gaps, (g) => g / eV) },
          series: [
            { name: 'eta_sq', label: 'Shockley–Queisser limit', unit: '', values: mapSeries(gaps, (g) => shockleyQueisserEfficiency(g, x.Ts, x.Ta, x.X)) },
            { name: 'eta_claimed', label: 'Claimed efficiency', unit: '', values: constantSeries(gaps.length, claimed) },
          ],
          yScale: 'linear',
        });
      } else {
        bound = eta_landsberg;
        const kind = x.junctions === 0 ? 'a converter of any kind' : `a stack of ${x.junctions} junctions`;
        message =
          claimed <= bound
            ? `The claimed efficiency, ${pct(claimed)}, is within the Landsberg bound for ${kind}, ${pct(eta_landsberg)}, for ${light} ` +
              `(Carnot ${pct(eta_carnot)}).`
            : `The claimed efficiency, ${pct(claimed)}, is ${fmt(claimed / bound)} times the Landsberg bound for ${kind}, ` +
              `${pct(eta_landsberg)}, for ${light} (Carnot ${pct(eta_carnot)}): no converter of that light does better, because the ` +
              'light brings entropy that the converter must shed as heat at its own temperature.';
      }
      if (claimed > bound) {
        message +=
          ' Efficiency figures come out high when the light is measured by a lamp brighter or of another spectrum than stated, ' +
          'when the area counted is smaller than the area lit, when concentration goes unmentioned, or when power is read at a ' +
          'point other than the maximum-power point of a stable curve.';
      }
    }
    if (bound > 0) outputs.push({ name: 'ratio', label: 'Claimed efficiency over the bound', si: claimed / bound, unit: '' });
    if (claimed > 1) {
      message += ` An efficiency above 100 % would also break conservation of energy outright.`;
    }
    return { check: 'light-converter-limits', outputs, verdict: { holds: claimed <= bound, message }, plots };
  },
};
