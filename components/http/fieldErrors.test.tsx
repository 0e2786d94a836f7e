import { ApiError } from './client';
import { fieldWords, messageWords, ordinalWord, placeFieldErrors, serverFieldErrors } from './fieldErrors';

describe('fieldWords', () => {
  it.each([
    ['files.2', 'the third file'],
    ['files.0', 'the first file'],
    ['files', 'the files'],
    ['body.figures.0.value', "the first figure's value"],
    ['body.figures.1.quantity', "the second figure's quantity"],
    ['body.seenAtUrl', 'the address where it was seen'],
    ['body.otherNames', 'the other names'],
    ['query.limit', 'the page size'],
    ['body.entries', 'the entries'],
  ])('%p → %p', (path, words) => {
    expect(fieldWords(path)).toBe(words);
  });

  it('uses a form\u2019s labels for named members, and never shows the raw path', () => {
    expect(fieldWords('inputs.P_in', { P_in: 'the input power' })).toBe('the input power');
    expect(fieldWords('inputs.P_in')).not.toContain('inputs.');
    expect(ordinalWord(11)).toBe('twelfth');
    expect(ordinalWord(20)).toBe('number 21');
  });
});

describe('messageWords', () => {
  it('puts the paths inside a server message into words', () => {
    expect(messageWords('Attachments must be PDF, PNG, JPEG or WebP files; files.2: this file is image/svg+xml (.svg).')).toBe(
      'Attachments must be PDF, PNG, JPEG or WebP files; the third file: this file is image/svg+xml (.svg).',
    );
    expect(messageWords('Check body.entries: at least one entry.')).toBe('Check the entries: at least one entry.');
    expect(messageWords('files.0, files.1: the file is empty.')).toBe('the first file, the second file: the file is empty.');
    // Addresses and decimals are not paths.
    expect(messageWords('See https://files.example.org/a and 3.5 kW')).toBe('See https://files.example.org/a and 3.5 kW');
  });
});

describe('placeFieldErrors', () => {
  it('puts messages beside their fields and keeps the rest', () => {
    const error = new ApiError(400, 'validation_failed', 'Check body.title', { 'body.title': 'too short', 'body.zzz': 'odd' });
    expect(placeFieldErrors(['title'] as const, serverFieldErrors(error))).toEqual({ fields: { title: 'too short' }, leftover: ['odd'] });
  });
});
