/**
 * Several devices in one text (shared/claims/plan/items.ts): which lines are items of a list, and the
 * check of one item with the others' figures set aside. Every text here is invented test data: invented
 * makers and models, example.org addresses.
 *
 * References: P = VI (Joule); the first law as output over input; the Carnot efficiency 1 − Tc/Th
 * (any thermodynamics textbook); °F → K as (t + 459.67)·5/9 (NIST SP 811 §4.2.1.1).
 */
import { runClaimChecks } from '../plan';
import { extractFigures } from '../reader';
import { listItems } from './items';

const labels = (text: string) => listItems(text).map((i) => i.label);
const checksOf = (text: string) => runClaimChecks(extractFigures(text), { text }).checks;

describe('which lines are items of a list of devices', () => {
  test('named lines, lettered options and bullets that name whole devices are items', () => {
    expect(labels('Small ORC units at the expo\n\nVessa 50: 50 kWe from hot water at 95 °C.\nThermagen T20: 20 kWe, needs at least 120 °C.\n')).toEqual(['Vessa 50', 'Thermagen T20']);
    expect(labels('A) 3-ton heat pump, 3.1 kW in.\nB) 80,000 BTU/h gas furnace, 96 % AFUE.\nC) Dual fuel: option A with the furnace.\n')).toEqual(['A', 'B', 'C']);
    expect(labels("- Rob's cargo bike: 48 V 17 Ah pack, 750 W hub.\n- A folding bike with a 250 W motor.\n- A question about chargers; answered.\n")).toEqual(["Rob's cargo bike", 'A folding bike', '']);
    expect(labels('Calderon 24c. 24 kW to heating.\nCalderon 30c. As above, 30/35 kW.\nMerrowby System 18. 18 kW, 96.5 % gross.\n')).toEqual(['Calderon 24c', 'Calderon 30c', 'Merrowby System 18']);
  });
  test("one device's fields, a letter's headers, a conversation's speakers, a patent's claims and numbered steps are no list of devices", () => {
    for (const text of [
      'Input: 2 kW\nOutput: 1.7 kW\nEfficiency: 85 %\n',
      '• 350 % efficient at A2/W35\n• Heat output: 7.35 kW | Electrical input: 2.1 kW\n• Sealed refrigerant circuit\n',
      '• rated electrical input 1.5 kW\n• shaft output 1.32 kW\n• efficiency 88 %\n',
      'From: a.reader@example.org\nTo: desk@example.org\nSubject: the 380 % heat pump\n',
      'PRESENTER: thirty watts into the cavity.\nAUDIENCE MEMBER: and the thrust?\nPRESENTER: 2.4 µN.\nAUDIENCE MEMBER: sealed?\n',
      'Customer (K. Lind): it drew 2 kW.\nCorvane support (A. Ruiz): that is the heater.\n',
      '1. A heat pump comprising a compressor of 2 kW.\n2. The heat pump of claim 1, giving 7 kW.\n',
      'Step 1. Temperatures: 95 °C and 65 °C.\nStep 2. Efficiency 2.1 %.\nStep 3. Carnot 8.2 %.\n',
      '- Drive motor: 750 W.\n- Hub generator pushing 14 A back into the same pack.\n',
    ]) {
      expect(labels(text)).toEqual([]);
    }
  });
});

describe("the check of one item, the others' figures set aside", () => {
  test('a catalogue line giving a larger output is no output of the motor whose input the first line gives', () => {
    const text = 'Motor selection, conveyor line 3\n\nSerie M90L, 4 poles: output 1,5 kW, input 1,85 kW, 1.420 rpm.\nSerie M100L: 2,2 kW output.\nSerie M80: 0,75 kW, too small.\nWe order two M90L.';
    const fl = checksOf(text).find((c) => c.check === 'first-law');
    // 1.5 kW out of 1.85 kW in: 0.810811 (node).
    expect(fl?.finding).toBe('consistent');
    expect(fl?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(1.5 / 1.85, 9);
    const aside = extractFigures(text).filter((f) => f.role === 'aside').map((f) => f.si);
    expect(aside).toEqual(expect.arrayContaining([2200, 750]));
  });
  test("a round-up's one impossible device is the one checked, each item read with its own words", () => {
    const text = "Stove-top thermoelectric generators compared\n\n- Flintco TG-5: rated 5 W with the hot plate at 200 °C; the module sheet gives 4.5 % conversion at a 150 K difference.\n- Grisby Ember: 3 W, USB only.\n- Ochre Cell: the seller claims 11 % conversion with the hot face at just 60 °C and a 30 K difference across the module.\nThe Ochre Cell is the one people ask about.";
    const carnot = checksOf(text).find((c) => c.check === 'carnot');
    // Th = 333.15 K, Tc = 303.15 K: Carnot 1 − 303.15/333.15 = 0.090050; 0.11 / 0.090050 = 1.22155 (node).
    expect(carnot?.finding).toBe('breaks');
    expect(carnot?.outputs.find((o) => o.name === 'eta_ratio')?.si).toBeCloseTo(0.11 / (1 - 303.15 / 333.15), 6);
  });
  test("a queue's one thread with a loop that feeds itself breaks the first law, whatever other threads give", () => {
    const text = "Moderator notes, electronics board\n\n• Thread 'Bench PSU recommendations': fine.\n• Thread 'My solid-state generator': the poster measures 1.5 A at 12 V going in and says the output runs a lamp bank at 3.2 A, also at 12 V.\n• Thread 'Cheap 30 V 5 A supply blew up': warned for language.";
    const fl = checksOf(text).find((c) => c.check === 'first-law');
    // 3.2 A × 12 V = 38.4 W out of 1.5 A × 12 V = 18 W in: 2.13333 (P = VI; node).
    expect(fl?.finding).toBe('breaks');
    expect(fl?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(38.4 / 18, 9);
  });
  test('an item that leans on another ("same bus") is not judged alone to break a law; the one named below the list is checked', () => {
    const text = 'DC-DC converters on the test bench\n\nQuillon QB-100: input 2.1 A at 48 V, output 8 A at 11.5 V. Runs warm.\nHartwell H12: 7.5 A out at 12.0 V for 2.0 A in, same bus.\nLyme D-series: would not start below 40 V.\nThe Quillon is the one we fitted.';
    const fl = checksOf(text).find((c) => c.check === 'first-law');
    // 8 × 11.5 = 92 W out of 2.1 × 48 = 100.8 W in: 0.912698 (node).
    expect(fl?.finding).toBe('consistent');
    expect(fl?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(92 / 100.8, 9);
  });
  test('a list whose items have no check sets the others aside all the same: no ledger across two posts', () => {
    const text = "Moderation log\n\n- User 'Halvard' posted a video of his magnet wheel, said to give 5 kW at the shaft while a little 12 V battery keeps the controller alive.\n- User 'peat_bog' asks about a 200 W solar panel. Moved.\n- Two duplicate posts removed.";
    expect(checksOf(text).some((c) => c.finding === 'breaks')).toBe(false);
    expect(extractFigures(text).find((f) => f.si === 200)?.role).toBe('aside');
  });
});

describe('a digest with one device named, and a drive said to make no ion wind', () => {
  test("a moderator's digest is a list though only one line names a device; the member's heater is checked", () => {
    const text =
      "Moderator's digest, energy forum, week 19\n\n- A member's cavitation water heater: over two weeks it 'produced 310 kWh of heat against 180 kWh of electricity on the meter'. Pinned for a reply.\n- A question about night-storage heaters (3.4 kW, 7 h charge); answered.\n- A complaint about a 9 kW shower tripping the breaker; moved.";
    expect(labels(text)).toEqual(["A member's cavitation water heater", '', '']);
    const fl = checksOf(text).find((c) => c.check === 'first-law');
    // 310 kWh out of 180 kWh in: 1.72222 (node).
    expect(fl?.finding).toBe('breaks');
    expect(fl?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(310 / 180, 9);
  });
  test("numbered sections of a report are no list, whatever its heading says", () => {
    expect(labels('Energy audit summary\n\n1. Existing plant. A gas boiler of 60 kW, 86 % seasonal.\n2. Proposed replacement. An air-source unit, 410 % efficient.\n3. Caveats. Performance falls on cold days.\n')).toEqual([]);
  });
  test("'with no ionisation and no ion wind' in high vacuum: no air pushed, the photon bound applies", () => {
    const text = "Grant round 7\n\nApplication 3: plasma actuator for drones, 12 g of thrust per 10 W stage in air. Plausible.\nApplication 7: a stack of asymmetric capacitors said to produce 40 µN/W in high vacuum 'with no ionisation and no ion wind', at 25 kV. Reviewers note that no propellant or exhaust is identified.\nApplication 9: bearing test rig, no propulsion claim.\nPanel consensus: application 7 cannot be funded as written.";
    const pb = checksOf(text).find((c) => c.check === 'photon-bound');
    // 40 µN/W × c = 4e-5 × 299 792 458 = 11 991.7 (F/P against 1/c; c from the SI Brochure).
    expect(pb?.finding).toBe('breaks');
    expect(pb?.outputs.find((o) => o.name === 'ratio')?.si).toBeCloseTo(4e-5 * 299792458, 1);
  });
});

describe("the item checked is read without the other items' words", () => {
  test("line A's monopropellant thruster and line B's electrospray say nothing of line C's sealed drive", () => {
    const text =
      "Reviewer 2, panel B: notes on the three propulsion proposals\n\nA. Green monopropellant thruster, 1 N class, Isp 235 s. Solid team, fund.\nB. Electrospray array, 0.2 mN per emitter cluster; needs a lifetime plan.\nC. 'Inertial displacement drive': two counter-rotating eccentric masses in a sealed case. The applicants report 3–6 mN of steady thrust for 40–50 W of electrical input, with no propellant and nothing leaving the case.";
    const pb = checksOf(text).find((c) => c.check === 'photon-bound');
    // Least severe ends: 3 mN against 50 W; F·c/P = 0.003 × 299 792 458 / 50 = 17 987.5 (c from the SI Brochure).
    expect(pb?.finding).toBe('breaks');
    expect(pb?.outputs.find((o) => o.name === 'ratio')?.si).toBeCloseTo((0.003 * 299792458) / 50, 3);
  });
  test("a closing remark's figure is not judged with another item: the option recommended is checked", () => {
    const text =
      "Replacement quotes (contractor's summary)\n\nA) 3-ton heat pump, 36,000 BTU/h heating at 47 °F outdoor, drawing 3.1 kW from the panel, supply air at 95 °F.\nB) 80,000 BTU/h gas furnace, 96 % AFUE.\nC) Dual fuel: option A with the furnace as back-up below 25 °F.\nWe recommend A; at 47 °F it puts out more than three times the heat it draws.";
    const checks = checksOf(text);
    expect(checks.some((c) => c.finding === 'breaks')).toBe(false);
    // 36,000 BTU/h = 10 550.56 W (BTU_IT/h = 0.293 071 1 W, NIST SP 811 B.8); COP 10 550.56/3 100 = 3.4034;
    // Carnot heating COP at 95 °F (308.15 K) over 47 °F (281.483 K) = 11.556; ratio 0.29452 (node).
    expect(checks.find((c) => c.check === 'carnot')?.outputs.find((o) => o.name === 'cop_heating_ratio')?.si).toBeCloseTo(0.29452, 4);
  });
});

describe('lawful round-ups, quotes and correspondence break no law (invented test data)', () => {
  test.each([
    "Heat pumps on show\n\n- Arden AW-7: 7 kW of heat at A7/W35 for 1.6 kW, COP 4.4.\n- Brisk Mono 5: 5 kW heat output, 'up to 480 % efficient'.\n- Corvel Split 9: 9 kW, quiet.\nAll three draw their extra heat from the outdoor air.",
    "Generator round-up\n\n1. Tamsin 2000i inverter generator: 2 kW continuous, 2.2 kW peak.\n2. Orrin P-3500: 3.5 kW, 30 kg.\n3. Solen Box 1000: a 1 kWh battery box that gives 1,000 W for about an hour, recharged from a 200 W panel.",
    "Quotes received\nA) Air-source heat pump, 8 kW output, 2.2 kW input at 7 °C.\nB) Condensing gas boiler, 24 kW, 94 % efficient.\nC) Electric flow boiler, 12 kW.\nWe chose A.",
    "Stand notes, day 2\n\nOrvik E-Drive 3: a 3 kW hub motor, 92 % efficient at 40 km/h.\nLumen Cell X: perovskite-silicon tandem, 31 % in the lab under one sun.\nPell Lifter: an ion-wind lifter, 30 kV at 1 mA, flying on its tether in room air.",
    "Submissions this week:\n• Thread 'Solar generator review': 500 Wh pack, charges from 100 W panel in 6 hours.\n• Thread 'My heat pump bill': 3,600 kWh of electricity for 12,000 kWh of heat last winter.\n• Thread 'Wind turbine output': 400 W turbine gives 30 kWh a month.",
    "Motors on test\n\nKell M1: 750 W shaft output, 900 W input.\nKell M2: 1.1 kW output, 1.3 kW input.\nKell M3: 1.5 kW output.",
    "Options for the workshop\nOption 1: a 9 kW electric heater, 100 % of its input as heat.\nOption 2: a 9 kW air-to-air heat pump using about 3 kW.\nOption 3: a wood stove, 8 kW.",
    "- Rob's e-bike: 36 V 10 Ah pack, 250 W motor, 60 km range.\n- Jen's cargo bike: 48 V 17 Ah pack, 750 W hub, regenerative braking adds a few per cent.\n- A folding bike with a 250 W motor.",
    "Hi Dana,\n\nThanks for the data. The pump drew 1.2 kW and lifted 3 L/s through 25 m, so it's about 61 % wire-to-water. Fine for its age.\n\nBest,\nSam Ortiz | Facilities, Example Water Trust | +44 20 7946 0123\nThis e-mail and any attachments are confidential.",
    "> On 3 May, K. Varga wrote:\n> The heat pump gives 9 kW of heat from 2.5 kW — isn't that over 100 %?\n\nNo: the other 6.5 kW comes from the outside air. A COP of 3.6 at 5 °C outside and 45 °C flow is normal; Carnot would allow about 8.\n\nRegards, L.",
    "Reviewer 2, point 3: \"The output of 140 W exceeds the 120 W input.\"\nResponse: The 140 W is heat delivered by the heat pump; the remaining 20 W is drawn from the ambient air at 18 °C. We have added the source temperature (18 °C) and sink (35 °C) to Section 2.",
    "-----Original Message-----\nFrom: press@example.org\nSent: 12 March 2026 09:14\nSubject: RE: your 'free heat' story\n\nThe unit takes 700 W and delivers 2.6 kW of heat to the tank; it is an air-source heat pump, not a free-energy device.",
    "Dear Examiner,\n\nClaim 1 as amended recites a generator delivering 4.8 kW at 1,500 rpm when driven by a 6 kW motor. We do not assert any gain; the loss of 1.2 kW appears as heat in the windings.\n\nYours faithfully,\nR. Lindqvist, for the applicant",
    "From: j.mbeki@example.org\nTo: editor@example.org\n\nYour piece says the flywheel 'gives back more than it takes'. My notes say 2.0 kWh in and 1.7 kWh out over the test — 85 %, which is what the maker claimed all along.\n\nJoe",
    "On Tue, 14 Apr 2026 at 10:02, Priya <priya@example.org> wrote:\n> So the 'overunity' cell really showed 3 W out for 2 W in?\nThe 2 W was only the pump laser; the cell also sat in 40 W of sunlight through the window. So no.",
    "Hi all — quick update from the test bay. The Stirling ran 6 hours on the 450 °C burner, gave 620 W at the shaft for 2.4 kW of gas. About 26 %. Next week we try a colder sink (12 °C instead of 30 °C).\n--\nMira, Example Engines Ltd",
    "Thank you for your question. Our solar generator stores 1.5 kWh and recharges from its 400 W panel in about 5 hours of full sun; it does not make energy of its own.\nCustomer care, Example Outdoor Co. (ticket #48211)",
    "> > Is 250 % efficiency possible?\n> For a heat pump, yes: it moves heat rather than making it.\nRight, and ours measured 2.5 kW heat for 1 kW electricity at 7 °C outdoor, 35 °C water."
  ])('%#', (text) => {
    expect(checksOf(text).filter((c) => c.finding === 'breaks')).toEqual([]);
  });
});
