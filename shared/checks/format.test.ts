import { fmt, fmtQ, fmtRatio } from './format';

// Formatting rules are our own (significant figures as in NIST SP 811 §7.9 style: the number, a space,
// the unit symbol, SI prefixes from the SI Brochure, 9th ed., Table 7).
describe('message formatting', () => {
  test('significant figures and powers of ten', () => {
    expect(fmt(0.4)).toBe('0.400');
    expect(fmt(299.792458)).toBe('300');
    expect(fmt(1.125)).toBe('1.13');
    expect(fmt(0.0012)).toBe('0.00120');
    expect(fmt(3.3356e-6)).toBe('3.34 × 10^-6');
    expect(fmt(1.2e9)).toBe('1.20 × 10^9');
    expect(fmt(-0.5)).toBe('-0.500');
    expect(fmt(0)).toBe('0');
    expect(fmt(9.9996)).toBe('10.0');
    expect(fmt(Number.POSITIVE_INFINITY)).toBe('infinity');
    expect(fmtRatio(2)).toBe('2.00 times');
  });
  test('SI prefixes where the unit takes them', () => {
    expect(fmtQ(1000 / 299792458, 'N')).toBe('3.34 µN');
    expect(fmtQ(1000, 'W')).toBe('1.00 kW');
    expect(fmtQ(999.96, 'W')).toBe('1.00 kW');
    expect(fmtQ(30000, 'm / s')).toBe('30.0 km/s');
    expect(fmtQ(0.0781, 'm')).toBe('78.1 mm');
    expect(fmtQ(2e-8, 's')).toBe('20.0 ns');
    expect(fmtQ(1e12, 's')).toBe('1.00 × 10^12 s');
    expect(fmtQ(300, 'K')).toBe('300 K');
    expect(fmtQ(1e-9, 'kg / s')).toBe('1.00 × 10^-9 kg/s');
    expect(fmtQ(0.4, '')).toBe('0.400');
  });
});
