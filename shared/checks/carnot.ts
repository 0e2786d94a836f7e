import { carnotCopCooling, carnotCopHeating, carnotEfficiency } from './formulas';
import { CAUTION_HEAT, CAUTION_MAINS, CAUTION_VACUUM } from './cautions';
import { fmt, fmtQ } from './format';
import { readInputs, requirePositive } from './inputs';
import { linspace, mapSeries, constantSeries } from './series';
import type { CheckDefinition, CheckInputSpec, CheckOutput, CheckPlot } from './types';

const inputs: CheckInputSpec[] = [
  { name: 'Th', label: 'Hot reservoir temperature', unit: 'K', default: '500 K', min: 0, max: 1e9, help: 'Absolute temperature; type "227 degC" for Celsius.' },
  {
    name: 'Tc',
    label: 'Cold reservoir temperature',
    unit: 'K',
    default: '300 K',
    min: 0,
    max: 1e9,
    help: 'Absolute temperature, not above the hot one; the same as the hot one for a machine said to work from a single reservoir.',
  },
  {
    name: 'eta_claimed',
    label: 'Claimed efficiency of a heat engine (0 = not claimed)',
    unit: '',
    default: '0.45',
    min: 0,
    max: 100,
    help: 'Work out over heat taken in at the hot side, as a fraction (0.45 for 45 %).',
  },
  {
    name: 'cop_heating_claimed',
    label: 'Claimed heating COP of a heat pump (0 = not claimed)',
    unit: '',
    default: '0',
    min: 0,
    max: 1e9,
    help: 'Heat delivered at the hot side over work put in.',
  },
  {
    name: 'cop_cooling_claimed',
    label: 'Claimed cooling COP of a refrigerator (0 = not claimed)',
    unit: '',
    default: '0',
    min: 0,
    max: 1e9,
    help: 'Heat drawn from the cold side over work put in.',
  },
];

export const carnot: CheckDefinition = {
  name: 'carnot',
  title: 'Heat engines, heat pumps and refrigerators against Carnot',
  summary:
    'No machine working between two temperatures can beat a reversible (Carnot) one: a heat engine turns at most ' +
    '1 − Tc/Th of the heat it takes in into work; a heat pump delivers at most Th/(Th − Tc) units of heat per unit ' +
    'of work; a refrigerator draws at most Tc/(Th − Tc). Temperatures are absolute (kelvins). With both at the same ' +
    'temperature there is one reservoir: an engine can do no work at all (bound 0), while moving heat needs no work ' +
    'in the ideal limit (no finite COP bound). Use it for any claim of efficiency or COP with stated temperatures.',
  condition:
    'claimed efficiency ≤ 1 − Tc/Th; claimed heating COP ≤ Th/(Th − Tc); claimed cooling COP ≤ Tc/(Th − Tc) ' +
    '(with Tc = Th: efficiency 0, no finite COP bound)',
  inputs,
  cautions: [CAUTION_HEAT, CAUTION_VACUUM, CAUTION_MAINS],
  run(si) {
    const x = readInputs(inputs, si);
    requirePositive('Th', 'The hot temperature', x.Th);
    requirePositive('Tc', 'The cold temperature', x.Tc);
    // carnotEfficiency throws CheckRangeError('Tc') when Tc > Th; Tc = Th is one reservoir, judged below.
    const eta = carnotEfficiency(x.Th, x.Tc);
    const copH = carnotCopHeating(x.Th, x.Tc);
    const copC = carnotCopCooling(x.Th, x.Tc);
    const single = x.Tc === x.Th;
    // Outputs are finite numbers (JSON has no infinity): with one reservoir the COP bounds, which are
    // infinite, are left out of the outputs and said in the verdict instead.
    const outputs: CheckOutput[] = [{ name: 'eta_max', label: 'Carnot efficiency 1 − Tc/Th', si: eta, unit: '' }];
    if (!single) {
      outputs.push(
        { name: 'cop_heating_max', label: 'Carnot heating COP Th/(Th − Tc)', si: copH, unit: '' },
        { name: 'cop_cooling_max', label: 'Carnot cooling COP Tc/(Th − Tc)', si: copC, unit: '' },
      );
    }
    const claims: { name: string; what: string; claimed: number; bound: number }[] = [];
    if (x.eta_claimed > 0) claims.push({ name: 'eta', what: 'heat-engine efficiency', claimed: x.eta_claimed, bound: eta });
    if (x.cop_heating_claimed > 0) claims.push({ name: 'cop_heating', what: 'heating COP', claimed: x.cop_heating_claimed, bound: copH });
    if (x.cop_cooling_claimed > 0) claims.push({ name: 'cop_cooling', what: 'cooling COP', claimed: x.cop_cooling_claimed, bound: copC });
    for (const c of claims) {
      const ratio = c.claimed / c.bound; // an efficiency claimed against a bound of 0 has no finite ratio
      if (Number.isFinite(ratio)) outputs.push({ name: `${c.name}_ratio`, label: `Claimed ${c.what} over the Carnot bound`, si: ratio, unit: '' });
    }
    const temps = single ? `with both reservoirs at ${fmtQ(x.Th, 'K')}` : `between ${fmtQ(x.Th, 'K')} and ${fmtQ(x.Tc, 'K')}`;
    const Temps = `${temps[0].toUpperCase()}${temps.slice(1)}`;
    let holds = true;
    let message: string;
    if (single) {
      const parts = claims.map((c) => {
        const ok = c.claimed <= c.bound;
        if (!ok) holds = false;
        return c.name === 'eta'
          ? `the claimed ${c.what}, ${fmt(c.claimed)}, is above the Carnot bound of 0`
          : `the claimed ${c.what}, ${fmt(c.claimed)}, is within Carnot, which sets no finite bound on it here`;
      });
      const explanation =
        'A heat engine working from a single reservoir can turn none of its heat into work: the Carnot efficiency ' +
        '1 − Tc/Th is 0 (the Kelvin–Planck statement of the second law). A heat pump or refrigerator moving heat between ' +
        'equal temperatures needs no work in the ideal limit: Th/(Th − Tc) and Tc/(Th − Tc) grow without limit as the ' +
        'difference vanishes, so there is no finite COP bound.';
      message =
        claims.length === 0
          ? `No efficiency or COP was claimed. ${Temps} (a single reservoir) the Carnot efficiency is 0 and no COP bound is finite. ${explanation}`
          : `${Temps} (a single reservoir), ${parts.join('; ')}. ${explanation}`;
      if (!holds) {
        message +=
          ' Work from a single reservoir would break the second law; ask for the cold side the machine rejects heat to, ' +
          'and check for other heat or work inputs left out (a battery, the mains, fuel, sunlight) and how work was measured.';
      }
    } else if (claims.length === 0) {
      message =
        `No efficiency or COP was claimed. ${Temps} the Carnot bounds are: efficiency ` +
        `${fmt(eta)}, heating COP ${fmt(copH)}, cooling COP ${fmt(copC)}.`;
    } else {
      const parts = claims.map((c) => {
        const ok = c.claimed <= c.bound;
        if (!ok) holds = false;
        return ok
          ? `the claimed ${c.what}, ${fmt(c.claimed)}, is within the Carnot bound of ${fmt(c.bound)} (${fmt(c.claimed / c.bound)} of it)`
          : `the claimed ${c.what}, ${fmt(c.claimed)}, is ${fmt(c.claimed / c.bound)} times the Carnot bound of ${fmt(c.bound)}`;
      });
      message = `${Temps}, ${parts.join('; ')}.`;
      if (!holds) {
        message +=
          ' Beating Carnot between two reservoirs would break the second law; check whether the stated temperatures ' +
          'are the real reservoir temperatures, whether other heat or work inputs were left out, and how heat and work were measured.';
      }
    }
    const tcs = linspace(0.01 * x.Th, 0.99 * x.Th, 99);
    const plot: CheckPlot = {
      kind: 'line',
      name: 'carnot-efficiency',
      title: `Carnot efficiency against the cold temperature, hot side at ${fmtQ(x.Th, 'K')}`,
      x: { label: 'Cold temperature Tc', unit: 'K', values: tcs },
      series: [{ name: 'eta_max', label: 'Carnot efficiency 1 − Tc/Th', unit: '', values: mapSeries(tcs, (tc) => carnotEfficiency(x.Th, tc)) }],
      yScale: 'linear',
    };
    if (x.eta_claimed > 0) {
      plot.series.push({ name: 'eta_claimed', label: 'Claimed efficiency', unit: '', values: constantSeries(tcs.length, x.eta_claimed) });
    }
    return { check: 'carnot', outputs, verdict: { holds, message }, plots: [plot] };
  },
};
