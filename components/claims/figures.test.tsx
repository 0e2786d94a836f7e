import { allReadable, figureDisplay, rangeDisplay, readDraftFully, toInputs, type FigureDraft } from './figures';
import { sentenceAfterFinding } from './ResultParts';

jest.mock('expo-router', () => require('../testing/expoRouter'));

const draft = (over: Partial<FigureDraft>): FigureDraft => ({ key: 'k', id: 'f1', kind: 'thrust', quantity: '3 mN', upper: '', role: null, ...over });

describe('rangeDisplay', () => {
  it('writes a range as in print: one unit when both ends share it, powers of ten as superscripts', () => {
    expect(rangeDisplay('3 mN')).toBe('3 mN');
    expect(rangeDisplay('3 mN', '6 mN')).toBe('3–6 mN');
    expect(rangeDisplay('0.45', '0.6')).toBe('0.45–0.6');
    expect(rangeDisplay('800 µN', '1.2 mN')).toBe('800 µN – 1.2 mN');
    expect(rangeDisplay('2.5 × 10^5 s', '3.1 × 10^5 s')).toBe('2.5–3.1 × 10⁵ s');
    expect(rangeDisplay('2.5 × 10^5 s', '3.1 × 10^6 s')).toBe('2.5 × 10⁵ s – 3.1 × 10⁶ s');
  });

  it('says the hedge before the value', () => {
    expect(figureDisplay({ display: '5 mN', hedge: 'up-to' })).toBe('up to 5 mN');
    expect(figureDisplay({ display: '2 kW', upper: { quantity: '3 kW', si: 3000, display: '3 kW' }, hedge: 'about' })).toBe('about 2–3 kW');
  });
});

describe('readDraftFully', () => {
  it('reads both ends, and says what is wrong with each and how to fix it', () => {
    expect(readDraftFully(draft({ upper: '6 mN' }))).toEqual({
      lower: { si: 0.003, display: '3 mN' },
      upper: { si: 0.006, display: '6 mN' },
      problems: {},
    });
    expect(readDraftFully(draft({ quantity: '' })).problems.quantity).toBe('Type the figure with its unit, for example 0.2 lbf, or remove the figure.');
    expect(readDraftFully(draft({ quantity: '3 W' })).problems.quantity).toMatch(/"3 W" is/);
    expect(readDraftFully(draft({ upper: '2 mN' })).problems.upper).toBe(
      'The upper end (2 mN) is below the lower end (3 mN); swap them, or clear the upper end for a single value.',
    );
    expect(allReadable([draft({}), draft({ upper: '6 mN' })])).toBe(true);
    expect(allReadable([draft({}), draft({ upper: '6 kg' })])).toBe(false);
  });

  it('sends the upper end only when there is one', () => {
    expect(toInputs([draft({ quantity: ' 3 mN ', upper: ' 6 mN ' }), draft({ upper: '  ' })])).toEqual([
      { kind: 'thrust', quantity: '3 mN', upper: '6 mN', role: null },
      { kind: 'thrust', quantity: '3 mN', role: null },
    ]);
  });
});

describe('sentenceAfterFinding', () => {
  it('drops the finding the sentence opens with, which the line above it says, and leaves other sentences alone', () => {
    const law = 'conservation of linear momentum';
    expect(sentenceAfterFinding({ law, sentence: `Conflicts with ${law}: the claimed thrust is 9 times the bound.` })).toBe(
      'The claimed thrust is 9 times the bound.',
    );
    expect(sentenceAfterFinding({ law: 'the second law (of thermodynamics)', sentence: 'Consistent with the second law (of thermodynamics): Within the bound.' })).toBe(
      'Within the bound.',
    );
    expect(sentenceAfterFinding({ law, sentence: 'The claimed thrust is 9 times the bound.' })).toBe('The claimed thrust is 9 times the bound.');
    expect(sentenceAfterFinding({ law, sentence: `Conflicts with ${law}.` })).toBe(`Conflicts with ${law}.`);
  });
});
