/**
 * The entry-file loader (shared/entries/load.ts) on files made for the test: malformed files are
 * refused with their name and line, and serializeEntryFile writes what parseEntryFile reads back.
 * The starter library itself is checked in load.test.ts.
 */
import { EntryFileError, parseEntryFile, serializeEntryFile } from './load';
import { IN_BRIEF_MAX_WORDS } from './schema';

/** Throws unless `fn` throws an EntryFileError; returns it. */
function refusal(fn: () => unknown): EntryFileError {
  try {
    fn();
  } catch (e) {
    if (e instanceof EntryFileError) return e;
    throw new Error(`expected an EntryFileError, got ${String(e)}`);
  }
  throw new Error('expected an EntryFileError, but the file was accepted');
}

function fixture(): string[] {
  return [
    '---', // 1
    'slug: tiny-test-entry', // 2
    'title: A tiny test entry', // 3
    'mechanismClass: over-unity', // 4
    'laws: [energy]', // 5
    'author: editor.one@example.org', // 6
    'reviewer: editor.two@example.org', // 7
    'worksheets:', // 8
    '  - name: tiny', // 9
    '    title: Tiny', // 10
    '    inputs:', // 11
    '      - { name: P, label: Power, unit: W, default: 1 W }', // 12
    '    steps:', // 13
    '      - { name: E, label: Energy in an hour, expression: P * 1 hour, unit: J }', // 14
    '---', // 15
    '', // 16
    '## In brief', // 17
    '', // 18
    'Short and plain.', // 19
    '', // 20
    '## How it is pitched', // 21
    '', // 22
    'As a machine.', // 23
    '', // 24
    '## Why it fails', // 25
    '', // 26
    'Energy is conserved: $E_\\text{out} \\le E_\\text{in}$.', // 27
    '', // 28
  ];
}
const join_ = (lines: string[]) => lines.join('\n');

describe('parseEntryFile on malformed files', () => {
  test('the fixture itself is valid, with defaults filled in', () => {
    const e = parseEntryFile(join_(fixture()), 'tiny-test-entry.md');
    expect(e.slug).toBe('tiny-test-entry');
    expect(e.inBrief).toBe('Short and plain.');
    expect(e.whatFakesTheEffect).toBe('');
    expect(e.changeNote).toBe('First published version.');
    expect(parseEntryFile(serializeEntryFile(e), 'tiny-test-entry.md')).toEqual(e);
  });

  test('Windows line endings read the same', () => {
    expect(parseEntryFile(fixture().join('\r\n'), 'x.md')).toEqual(parseEntryFile(join_(fixture()), 'x.md'));
  });

  test('bad YAML is refused with the file name and the line', () => {
    const lines = fixture();
    lines[2] = 'title: [A tiny test entry'; // line 3: an unclosed flow sequence
    const err = refusal(() => parseEntryFile(join_(lines), 'bad-yaml.md'));
    expect(err.fileName).toBe('bad-yaml.md');
    expect(err.field).toBe('yaml');
    expect(err.line).toBeGreaterThanOrEqual(3);
    expect(err.line).toBeLessThanOrEqual(4);
    expect(err.message).toMatch(/^bad-yaml\.md:\d+: yaml: /);
  });

  test('a duplicate front-matter key is refused with its line', () => {
    const lines = fixture();
    lines.splice(3, 0, 'title: Another title'); // new line 4
    const err = refusal(() => parseEntryFile(join_(lines), 'dup.md'));
    expect(err.field).toBe('yaml');
    expect(err.line).toBe(4);
  });

  test('a file without front matter is refused at line 1', () => {
    const err = refusal(() => parseEntryFile('## In brief\n\nNo front matter.\n', 'bare.md'));
    expect(err.line).toBe(1);
    expect(err.field).toBe('front matter');
    expect(err.message).toMatch(/^bare\.md:1: front matter: /);
  });

  test('front matter that is never closed is refused', () => {
    const lines = fixture().slice(0, 14);
    const err = refusal(() => parseEntryFile(join_(lines), 'open.md'));
    expect(err.field).toBe('front matter');
    expect(err.message).toContain('not closed');
  });

  test('an unknown section heading is refused with its line', () => {
    const lines = fixture();
    lines.push('## Background', '', 'Some history.'); // line 29
    const err = refusal(() => parseEntryFile(join_(lines), 'unknown-heading.md'));
    expect(err.line).toBe(29);
    expect(err.field).toBe('body');
    expect(err.message).toBe(
      `unknown-heading.md:29: body: unknown section heading "## Background"; the sections are "In brief", "How it is pitched", "Why it fails", "Artifacts that can look like the effect", "Cautions" (use "###" for a sub-heading)`,
    );
  });

  test('a heading in the wrong case is refused with a hint', () => {
    const lines = fixture();
    lines[24] = '## Why It Fails'; // line 25
    const err = refusal(() => parseEntryFile(join_(lines), 'case.md'));
    expect(err.line).toBe(25);
    expect(err.message).toContain('write it as "## Why it fails"');
  });

  test('a missing In brief is refused, naming the field and where it belongs', () => {
    const lines = fixture();
    lines.splice(16, 4); // drop lines 17–20 ("## In brief" and its text); "How it is pitched" moves to line 17
    const err = refusal(() => parseEntryFile(join_(lines), 'no-brief.md'));
    expect(err.field).toBe('inBrief');
    expect(err.line).toBe(17);
    expect(err.message).toBe('no-brief.md:17: inBrief: the required section "## In brief" is missing');
  });

  test('an empty required section is refused at its heading', () => {
    const lines = fixture();
    lines[22] = ''; // line 23: the text of "How it is pitched"
    const err = refusal(() => parseEntryFile(join_(lines), 'empty.md'));
    expect(err.field).toBe('howItIsPitched');
    expect(err.line).toBe(21);
  });

  test('In brief over 120 words is refused at its heading', () => {
    const lines = fixture();
    lines[18] = Array.from({ length: IN_BRIEF_MAX_WORDS + 1 }, (_, i) => `word${i}`).join(' ');
    const err = refusal(() => parseEntryFile(join_(lines), 'long-brief.md'));
    expect(err.field).toBe('inBrief');
    expect(err.line).toBe(17);
    expect(err.message).toContain(`has ${IN_BRIEF_MAX_WORDS + 1} words; at most ${IN_BRIEF_MAX_WORDS}`);
    // Exactly 120 words is accepted.
    lines[18] = Array.from({ length: IN_BRIEF_MAX_WORDS }, (_, i) => `word${i}`).join(' ');
    expect(parseEntryFile(join_(lines), 'long-brief.md').inBrief.split(' ')).toHaveLength(IN_BRIEF_MAX_WORDS);
  });

  test('a bad slug is refused with the line of the slug', () => {
    const lines = fixture();
    lines[1] = 'slug: Tiny_Test Entry';
    const err = refusal(() => parseEntryFile(join_(lines), 'bad-slug.md'));
    expect(err.field).toBe('slug');
    expect(err.line).toBe(2);
    expect(err.message).toMatch(/^bad-slug\.md:2: slug: lower-case words joined by hyphens/);
  });

  test('a missing required field points at the front matter', () => {
    const lines = fixture();
    lines.splice(2, 1); // no title
    const err = refusal(() => parseEntryFile(join_(lines), 'no-title.md'));
    expect(err.field).toBe('title');
    expect(err.line).toBe(2);
  });

  test('an unknown front-matter field, or a body section in the front matter, is refused with its line', () => {
    const lines = fixture();
    lines.splice(3, 0, 'mechanismclass: over-unity'); // line 4: a typo
    let err = refusal(() => parseEntryFile(join_(lines), 'typo.md'));
    expect(err.field).toBe('mechanismclass');
    expect(err.line).toBe(4);
    const lines2 = fixture();
    lines2.splice(3, 0, 'inBrief: In the wrong place.');
    err = refusal(() => parseEntryFile(join_(lines2), 'misplaced.md'));
    expect(err.field).toBe('inBrief');
    expect(err.line).toBe(4);
    expect(err.message).toContain('belongs in the body');
  });

  test('a section twice, or out of order, is refused', () => {
    const twice = fixture();
    twice.push('## In brief', '', 'Again.'); // line 29
    let err = refusal(() => parseEntryFile(join_(twice), 'twice.md'));
    expect(err.line).toBe(29);
    expect(err.message).toContain('appears twice (first on line 17)');
    const order = fixture();
    order.push('## Cautions', '', 'Careful.', '', '## Artifacts that can look like the effect', '', 'Drift.'); // lines 29, 33
    err = refusal(() => parseEntryFile(join_(order), 'order.md'));
    expect(err.line).toBe(33);
    expect(err.message).toContain('out of order');
  });

  test('text before the first section is refused', () => {
    const lines = fixture();
    lines[15] = 'Stray paragraph.'; // line 16
    const err = refusal(() => parseEntryFile(join_(lines), 'stray.md'));
    expect(err.field).toBe('body');
    expect(err.line).toBe(16);
  });

  test('a level-1 heading or a dashed underline inside a section is refused', () => {
    const h1 = fixture();
    h1[22] = '# A title'; // line 23
    expect(refusal(() => parseEntryFile(join_(h1), 'h1.md')).line).toBe(23);
    const setext = fixture();
    setext.splice(23, 0, '---'); // line 24, right under "As a machine."
    expect(refusal(() => parseEntryFile(join_(setext), 'setext.md')).line).toBe(24);
  });

  test('headings inside fenced code and level-3 sub-headings stay in the section', () => {
    const lines = fixture();
    lines.splice(23, 0, '', '### A sub-heading', '', '```', '## not a heading', '```');
    const e = parseEntryFile(join_(lines), 'fenced.md');
    expect(e.howItIsPitched).toBe('As a machine.\n\n### A sub-heading\n\n```\n## not a heading\n```');
    expect(parseEntryFile(serializeEntryFile(e), 'fenced.md')).toEqual(e);
  });

  test('a worksheet that does not compile is refused at the line of its expression', () => {
    const lines = fixture();
    lines[13] = '      - { name: E, label: Energy in an hour, expression: P * 1 hour + 1 m, unit: J }'; // line 14
    const err = refusal(() => parseEntryFile(join_(lines), 'bad-sheet.md'));
    expect(err.field).toBe('worksheets.0.steps.0.expression');
    expect(err.line).toBe(14);
    expect(err.message).toMatch(/^bad-sheet\.md:14: worksheets\.0\.steps\.0\.expression: Step E: /);
    // The schema alone does not compile it.
    expect(parseEntryFile(join_(lines), 'bad-sheet.md', { checkWorksheets: false }).worksheets).toHaveLength(1);
  });

  test('a bad citation is refused at its line', () => {
    const lines = fixture();
    lines.splice(14, 0, 'sources:', '  - csl: { id: x, type: book }', '    note: no title'); // lines 15–17
    const err = refusal(() => parseEntryFile(join_(lines), 'bad-source.md'));
    expect(err.field).toBe('sources.0.csl.title');
    expect(err.line).toBe(16);
  });

  test('all problems are listed, the first one in the message head', () => {
    const lines = fixture();
    lines[1] = 'slug: Bad Slug';
    lines[6] = 'reviewer: not-an-address';
    const err = refusal(() => parseEntryFile(join_(lines), 'two.md'));
    expect(err.problems.map((p) => [p.field, p.line])).toEqual([
      ['slug', 2],
      ['reviewer', 7],
    ]);
    expect(err.message.split('\n')).toHaveLength(2);
  });
});

describe('serializeEntryFile', () => {
  const base = () => parseEntryFile(join_(fixture()), 'tiny-test-entry.md');

  test('writes front matter then the body sections under their headings, leaving out empty optional ones', () => {
    const text = serializeEntryFile(base());
    expect(text.startsWith('---\nslug: tiny-test-entry\n')).toBe(true);
    expect(text).toContain('\n## In brief\n\nShort and plain.\n');
    expect(text).not.toContain('## Cautions');
    const withCautions = { ...base(), cautions: 'Mind the voltage.' };
    expect(parseEntryFile(serializeEntryFile(withCautions), 'x.md').cautions).toBe('Mind the voltage.');
  });

  test('refuses a section whose text holds a level-2 heading, which would not read back', () => {
    const err = refusal(() => serializeEntryFile({ ...base(), whyItFails: 'Text.\n\n## Extra\n\nMore.' }));
    expect(err.field).toBe('whyItFails');
    expect(err.fileName).toBe('tiny-test-entry.md');
  });

  test('keeps TeX, lists and YAML-special characters intact', () => {
    const e = {
      ...base(),
      title: 'A title: with a colon, # and "quotes"',
      whyItFails: '$$p_z = \\gamma m v_z$$\n\n- one: two\n- `code` & *emphasis*',
      questionsToAsk: ['- starts with a dash?', '{braces} and: colons'],
    };
    expect(parseEntryFile(serializeEntryFile(e), 'x.md')).toEqual(e);
  });
});
