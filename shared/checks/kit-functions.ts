/**
 * The check kit's numeric cores as worksheet functions (snake_case names). Arguments arrive in the SI
 * units declared here; the result has the declared SI unit. Each `fn` is the very function the checks
 * call (formulas.ts), so a worksheet and a check give the same number.
 */
import type { KitFunction } from '../worksheet/types';
import * as f from './formulas';

export const kitFunctions: Record<string, KitFunction> = {
  photon_thrust_bound: {
    summary: 'Largest thrust of a device that emits only radiation of power P: P/c.',
    args: [{ name: 'P', unit: 'W' }],
    unit: 'N',
    fn: f.photonThrustBound,
  },
  break_even_speed: {
    summary: 'Speed at which a constant thrust F fed with power P gains kinetic energy as fast as it is fed: P/F.',
    args: [
      { name: 'P', unit: 'W' },
      { name: 'F', unit: 'N' },
    ],
    unit: 'm / s',
    fn: f.breakEvenSpeed,
  },
  kinetic_power: {
    summary: 'Power a thrust F delivers to a body moving at v along it: F·v.',
    args: [
      { name: 'F', unit: 'N' },
      { name: 'v', unit: 'm / s' },
    ],
    unit: 'W',
    fn: f.kineticPower,
  },
  carnot_efficiency: {
    summary: "Carnot's bound on a heat engine's efficiency between Th and Tc: 1 − Tc/Th.",
    args: [
      { name: 'Th', unit: 'K' },
      { name: 'Tc', unit: 'K' },
    ],
    unit: '',
    fn: f.carnotEfficiency,
  },
  carnot_cop_heating: {
    summary: "Carnot's bound on a heat pump's heating COP: Th/(Th − Tc).",
    args: [
      { name: 'Th', unit: 'K' },
      { name: 'Tc', unit: 'K' },
    ],
    unit: '',
    fn: f.carnotCopHeating,
  },
  carnot_cop_cooling: {
    summary: "Carnot's bound on a refrigerator's cooling COP: Tc/(Th − Tc).",
    args: [
      { name: 'Th', unit: 'K' },
      { name: 'Tc', unit: 'K' },
    ],
    unit: '',
    fn: f.carnotCopCooling,
  },
  exhaust_speed_from_isp: {
    summary: 'Effective exhaust speed from specific impulse: Isp·g0.',
    args: [{ name: 'Isp', unit: 's' }],
    unit: 'm / s',
    fn: f.exhaustSpeedFromIsp,
  },
  tsiolkovsky_dv: {
    summary: 'Ideal velocity change of a rocket (Tsiolkovsky): v_e ln(m0/m1).',
    args: [
      { name: 'v_e', unit: 'm / s' },
      { name: 'm0', unit: 'kg' },
      { name: 'm1', unit: 'kg' },
    ],
    unit: 'm / s',
    fn: f.tsiolkovskyDv,
  },
  lead_lorentz_force: {
    summary: 'Largest Lorentz force on a supply lead of length L carrying current I across a field B: I·L·B.',
    args: [
      { name: 'I', unit: 'A' },
      { name: 'L', unit: 'm' },
      { name: 'B', unit: 'T' },
    ],
    unit: 'N',
    fn: f.leadLorentzForce,
  },
  radiation_recoil_force: {
    summary: 'Recoil of waste heat P radiated with net asymmetry fraction f: f·P/c.',
    args: [
      { name: 'P', unit: 'W' },
      { name: 'f', unit: '' },
    ],
    unit: 'N',
    fn: f.radiationRecoilForce,
  },
  thermal_drift_force: {
    summary: "Apparent force from a balance's thermal drift: sensitivity k (force per kelvin) times temperature rise.",
    args: [
      { name: 'k', unit: 'N / K' },
      { name: 'dT', unit: 'K' },
    ],
    unit: 'N',
    fn: f.thermalDriftForce,
  },
  outgassing_force: {
    summary: 'Reaction force of gas leaving one way at mass rate mdot and speed v: mdot·v.',
    args: [
      { name: 'mdot', unit: 'kg / s' },
      { name: 'v', unit: 'm / s' },
    ],
    unit: 'N',
    fn: f.outgassingForce,
  },
  gyro_frequency: {
    summary: 'Angular gyro-frequency of a charge q, mass m, Lorentz factor gamma in a field B: |q|B/(gamma m), in rad/s.',
    args: [
      { name: 'q', unit: 'C' },
      { name: 'B', unit: 'T' },
      { name: 'm', unit: 'kg' },
      { name: 'gamma', unit: '' },
    ],
    unit: 'rad / s',
    fn: f.gyroFrequency,
  },
  gyro_radius: {
    summary: 'Gyro-radius of a charge q with momentum p_perp across a field B: p_perp/(|q|B).',
    args: [
      { name: 'p_perp', unit: 'kg m / s' },
      { name: 'q', unit: 'C' },
      { name: 'B', unit: 'T' },
    ],
    unit: 'm',
    fn: f.gyroRadius,
  },
  gamma_from_kinetic_energy: {
    summary: 'Lorentz factor of a particle of mass m with kinetic energy K: 1 + K/(m c²).',
    args: [
      { name: 'K', unit: 'J' },
      { name: 'm', unit: 'kg' },
    ],
    unit: '',
    fn: f.gammaFromKineticEnergy,
  },
  first_law_balance: {
    summary: 'First-law balance of a cycle: energy in − energy out − increase of stored energy.',
    args: [
      { name: 'E_in', unit: 'J' },
      { name: 'E_out', unit: 'J' },
      { name: 'dE_stored', unit: 'J' },
    ],
    unit: 'J',
    fn: f.firstLawBalance,
  },
  over_unity_ratio: {
    summary: 'Energy out over the net energy supplied: E_out/(E_in − dE_stored); above 1 breaks the first law.',
    args: [
      { name: 'E_in', unit: 'J' },
      { name: 'E_out', unit: 'J' },
      { name: 'dE_stored', unit: 'J' },
    ],
    unit: '',
    fn: f.overUnityRatio,
  },
  faraday_moles: {
    summary: "Amount of substance a current I turns over in a time t at z electrons per formula unit (Faraday's law): I·t/(z·F).",
    args: [
      { name: 'I', unit: 'A' },
      { name: 't', unit: 's' },
      { name: 'z', unit: '' },
    ],
    unit: 'mol',
    fn: f.faradayMoles,
  },
  ideal_gas_volume: {
    summary: 'Volume of n moles of an ideal gas at temperature T and pressure p: n·R·T/p.',
    args: [
      { name: 'n', unit: 'mol' },
      { name: 'T', unit: 'K' },
      { name: 'p', unit: 'Pa' },
    ],
    unit: 'm^3',
    fn: f.idealGasVolume,
  },
  atoms_in_mass: {
    summary: 'Number of atoms in a mass m of an element of molar mass M: m·N_A/M.',
    args: [
      { name: 'm', unit: 'kg' },
      { name: 'M', unit: 'kg / mol' },
    ],
    unit: '',
    fn: f.atomsInMass,
  },
  reaction_rate: {
    summary: 'Reactions per second that give a power P when each releases an energy Q: P/Q.',
    args: [
      { name: 'P', unit: 'W' },
      { name: 'Q', unit: 'J' },
    ],
    unit: 'Hz',
    fn: f.reactionRate,
  },
  isotropic_fluence_rate: {
    summary: 'Particles per area and time at a distance r from a source emitting S per second in all directions alike: S/(4πr²).',
    args: [
      { name: 'S', unit: 'Hz' },
      { name: 'r', unit: 'm' },
    ],
    unit: 'm^-2 s^-1',
    fn: f.isotropicFluenceRate,
  },
  aerodynamic_drag: {
    summary: 'Aerodynamic drag at speed v in air of density rho: ½·rho·Cd·A·v².',
    args: [
      { name: 'rho', unit: 'kg / m^3' },
      { name: 'Cd', unit: '' },
      { name: 'A', unit: 'm^2' },
      { name: 'v', unit: 'm / s' },
    ],
    unit: 'N',
    fn: f.aerodynamicDrag,
  },
  rolling_resistance: {
    summary: 'Rolling resistance of a vehicle of mass m on level ground: Crr·m·g0.',
    args: [
      { name: 'Crr', unit: '' },
      { name: 'm', unit: 'kg' },
    ],
    unit: 'N',
    fn: f.rollingResistance,
  },
  road_load: {
    summary: 'Road load on level ground at a steady speed v, energy per metre: ½·rho·Cd·A·v² + Crr·m·g0.',
    args: [
      { name: 'rho', unit: 'kg / m^3' },
      { name: 'Cd', unit: '' },
      { name: 'A', unit: 'm^2' },
      { name: 'v', unit: 'm / s' },
      { name: 'Crr', unit: '' },
      { name: 'm', unit: 'kg' },
    ],
    unit: 'N',
    fn: f.roadLoad,
  },
  generator_drag: {
    summary: "Least drag an on-board generator delivering P_gen from the vehicle's own motion adds at speed v: P_gen/v.",
    args: [
      { name: 'P_gen', unit: 'W' },
      { name: 'v', unit: 'm / s' },
    ],
    unit: 'N',
    fn: f.generatorDrag,
  },
  landsberg_efficiency: {
    summary: "Landsberg's bound on converting blackbody radiation at Ts with a converter at Ta: 1 − 4/3·(Ta/Ts) + 1/3·(Ta/Ts)⁴.",
    args: [
      { name: 'Ts', unit: 'K' },
      { name: 'Ta', unit: 'K' },
    ],
    unit: '',
    fn: f.landsbergEfficiency,
  },
  photon_conversion_bound: {
    summary: 'Largest power efficiency of a converter of light of photon energy E_photon giving QE carriers per photon at voltage V: QE·q·V/E_photon.',
    args: [
      { name: 'QE', unit: '' },
      { name: 'V', unit: 'V' },
      { name: 'E_photon', unit: 'J' },
    ],
    unit: '',
    fn: f.photonConversionBound,
  },
  landauer_bound: {
    summary: "Landauer's bound: the least heat given off for each bit erased with surroundings at T, k_B·T·ln 2.",
    args: [{ name: 'T', unit: 'K' }],
    unit: 'J',
    fn: f.landauerBound,
  },
};
