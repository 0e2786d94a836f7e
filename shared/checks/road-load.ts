import { CAUTION_ROTATING, CAUTION_VEHICLES } from './cautions';
import { fmt, fmtQ } from './format';
import { aerodynamicDrag, generatorDrag, roadLoad, rollingResistance } from './formulas';
import { readInputs, requirePositive } from './inputs';
import { constantSeries, linspace, mapSeries } from './series';
import type { CheckDefinition, CheckInputSpec, CheckOutput } from './types';

const inputs: CheckInputSpec[] = [
  { name: 'm', label: 'Vehicle mass, loaded', unit: 'kg', default: '1500 kg', min: 0, max: 1e6, help: 'The mass on the wheels, with driver and load.' },
  {
    name: 'v',
    label: 'Steady speed',
    unit: 'm / s',
    displayUnit: 'km / h',
    default: '100 km / h',
    min: 0,
    max: 300,
    help: 'On level ground, no wind; type "60 mph" or "100 km / h".',
  },
  {
    name: 'Cd',
    label: 'Drag coefficient C_d',
    unit: '',
    default: '0.30',
    min: 0,
    max: 3,
    help: 'About 0.25–0.35 for cars, 0.6–0.9 for trucks and buses (common practice, no source).',
  },
  { name: 'A', label: 'Frontal area', unit: 'm^2', default: '2.2 m^2', min: 0, max: 100, help: 'About 2–2.5 m² for cars (common practice, no source).' },
  {
    name: 'Crr',
    label: 'Rolling-resistance coefficient C_rr',
    unit: '',
    default: '0.010',
    min: 0,
    max: 0.5,
    help: 'About 0.007–0.015 for car tyres on asphalt (common practice, no source).',
  },
  {
    name: 'rho',
    label: 'Air density',
    unit: 'kg / m^3',
    default: '1.225 kg / m^3',
    min: 0,
    max: 10,
    help: '1.225 kg/m³ at sea level in the standard atmosphere (ISO 2533:1975: 15 °C, 101.325 kPa).',
  },
  {
    name: 'P_gen',
    label: 'Power the claim says an on-board generator returns (0 = none)',
    unit: 'W',
    displayUnit: 'kW',
    default: '5 kW',
    min: 0,
    max: 1e9,
    help: 'A wind turbine on the roof, an alternator on a wheel, or any generator driven by the moving vehicle.',
  },
  {
    name: 'P_net_claimed',
    label: 'Net power the claim says the vehicle draws from its battery or fuel at this speed',
    unit: 'W',
    displayUnit: 'kW',
    default: '0 kW',
    min: 0,
    max: 1e9,
    help: '0 for a vehicle said to recharge itself fully while driving; otherwise the claimed draw (e.g. a range on a battery of given energy, times the speed, over the range).',
  },
];

/** A speed in km/h for the words. */
const kmh = (v: number) => `${fmt(v * 3.6)} km/h`;

/**
 * The energy a vehicle needs per distance at a steady speed on level ground (the road load: air
 * drag plus rolling resistance; a force is an energy per metre), and what an on-board generator
 * driven by the vehicle's own motion costs: at least P_gen/v of extra drag, so at least the power it
 * returns. Against a claim of a vehicle that charges itself while driving.
 */
export const roadLoadCheck: CheckDefinition = {
  name: 'road-load',
  title: 'Road load of a vehicle against a self-charging claim',
  summary:
    'A vehicle at a steady speed v on level ground pushes against air drag ½·ρ·C_d·A·v² and rolling resistance C_rr·m·g; ' +
    'that force is the energy it needs per metre, and force × speed is the power. A generator driven by the vehicle\'s own ' +
    'motion (a roof turbine, a wheel alternator) adds at least P_gen/v of drag, so it costs at least the power it returns. ' +
    'A family car at 100 km/h needs roughly 10–15 kW at the wheels. Use it for any vehicle said to charge itself while driving.',
  condition: 'claimed net power from the battery or fuel ≥ road load × v; a generator costs ≥ the power it returns',
  inputs,
  cautions: [CAUTION_VEHICLES, CAUTION_ROTATING],
  run(si) {
    const x = readInputs(inputs, si);
    requirePositive('v', 'The speed', x.v);
    const F_aero = aerodynamicDrag(x.rho, x.Cd, x.A, x.v);
    const F_roll = rollingResistance(x.Crr, x.m);
    const F_road = roadLoad(x.rho, x.Cd, x.A, x.v, x.Crr, x.m);
    const P_road = F_road * x.v;
    const F_gen = generatorDrag(x.P_gen, x.v);
    const P_drive = (F_road + F_gen) * x.v;
    const outputs: CheckOutput[] = [
      { name: 'F_aero', label: 'Air drag ½·ρ·C_d·A·v²', si: F_aero, unit: 'N' },
      { name: 'F_roll', label: 'Rolling resistance C_rr·m·g', si: F_roll, unit: 'N' },
      { name: 'F_road', label: 'Road load', si: F_road, unit: 'N' },
      { name: 'E_per_distance', label: 'Energy per distance at the wheels', si: F_road, unit: 'J / m', displayUnit: 'W h / km' },
      { name: 'P_road', label: 'Power at the wheels', si: P_road, unit: 'W', displayUnit: 'kW' },
      { name: 'F_gen', label: 'Least drag the generator adds, P_gen/v', si: F_gen, unit: 'N' },
      { name: 'P_drive', label: 'Least drive power with the generator running', si: P_drive, unit: 'W', displayUnit: 'kW' },
    ];
    if (P_road > 0) outputs.push({ name: 'net_ratio', label: 'Claimed net power over the road-load power', si: x.P_net_claimed / P_road, unit: '' });
    const holds = P_road === 0 || x.P_net_claimed >= P_road * (1 - 1e-9);
    const load =
      `${fmtQ(P_road, 'W')} the road load takes at the wheels (${fmtQ(F_road, 'N')}: air drag ${fmtQ(F_aero, 'N')}, rolling ` +
      `resistance ${fmtQ(F_roll, 'N')}; that is ${fmtQ(F_road, 'J')} per metre, ${fmt(F_road / 3.6)} Wh per km)`;
    let message: string;
    if (holds) {
      message =
        `The claimed net draw at ${kmh(x.v)}, ${fmtQ(x.P_net_claimed, 'W')}, covers the ${load}` +
        `${P_road > 0 ? `, ${fmt(x.P_net_claimed / P_road)} times over` : ''}, before the losses of motor and drivetrain.`;
    } else if (x.P_net_claimed > 0) {
      message =
        `The claimed net draw at ${kmh(x.v)}, ${fmtQ(x.P_net_claimed, 'W')}, is ${fmt(x.P_net_claimed / P_road)} of the ${load}. ` +
        'The rest of the energy the vehicle spends against the air and the road would have to come from nowhere.';
    } else {
      message =
        `The claim has the vehicle draw nothing net from its battery or fuel at ${kmh(x.v)}, against the ${load}. ` +
        'All the energy it spends against the air and the road would have to come from nowhere.';
    }
    if (x.P_gen > 0) {
      message +=
        ` A generator returning ${fmtQ(x.P_gen, 'W')} from the vehicle's own motion adds at least ${fmtQ(F_gen, 'N')} of drag ` +
        `(P_gen/v), so the drive must then supply at least ${fmtQ(P_drive, 'W')} to get ${fmtQ(x.P_gen, 'W')} back: such a ` +
        'generator returns less than it costs and can only add losses.';
    }
    if (!holds) {
      message +=
        ' Claims of this kind often rest on a short test from a full battery, on coasting or downhill stretches, on a generator ' +
        'driven on a stand rather than by the moving vehicle, or on charging counted without the energy it drew.';
    }

    const vmax = Math.max(2 * x.v, 10);
    const speeds = linspace(0, vmax, 101);
    const kW = (f: (v: number) => number) => mapSeries(speeds, (v) => f(v) / 1000);
    return {
      check: 'road-load',
      outputs,
      verdict: { holds, message },
      plots: [
        {
          kind: 'line',
          name: 'power-vs-speed',
          title: 'Power at the wheels against speed',
          x: { label: 'Speed', unit: 'km/h', values: mapSeries(speeds, (v) => v * 3.6) },
          series: [
            { name: 'P_road', label: 'Road load × speed', unit: 'kW', values: kW((v) => roadLoad(x.rho, x.Cd, x.A, v, x.Crr, x.m) * v) },
            ...(x.P_gen > 0
              ? [{ name: 'P_drive', label: 'With the generator running', unit: 'kW', values: kW((v) => roadLoad(x.rho, x.Cd, x.A, v, x.Crr, x.m) * v + x.P_gen) }]
              : []),
            { name: 'P_net_claimed', label: 'Claimed net draw', unit: 'kW', values: constantSeries(speeds.length, x.P_net_claimed / 1000) },
          ],
          yScale: 'linear',
        },
      ],
    };
  },
};
