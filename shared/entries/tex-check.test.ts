/**
 * texProblems finds each formula the renderer would find and asks KaTeX itself whether it parses:
 * the expected messages come from KaTeX (the reference), the lines from counting the fixture's lines.
 */
import katex from 'katex';
import { renderMarkdown } from '../markdown';
import { contentTexProblems, texProblems, texProblemWords } from './tex-check';

/** KaTeX's own words for a formula it refuses. */
function katexSays(tex: string, displayMode = false): string {
  try {
    katex.renderToString(tex, { throwOnError: true, displayMode, strict: 'ignore' });
  } catch (err) {
    return (err as { rawMessage: string }).rawMessage;
  }
  throw new Error(`KaTeX read ${tex}`);
}

describe('texProblems', () => {
  it('finds nothing in text without formulas, or whose formulas parse', () => {
    expect(texProblems('No formulas here, only 5 dollars.')).toEqual([]);
    expect(texProblems('Inline $F \\le P/c$ and $$E = mc^2$$ on one line.\n\n$$\n\\frac{dp}{dt} = 0\n$$')).toEqual([]);
  });

  it('names the line of an inline formula and KaTeX’s message', () => {
    const md = 'First line.\nSecond line.\nThird has $x^$ here.';
    expect(texProblems(md)).toEqual([{ line: 3, message: katexSays('x^'), tex: 'x^' }]);
  });

  it('counts lines inside a display block to the command KaTeX stopped at', () => {
    // Line 3 opens the block, line 4 is fine, line 5 holds the unknown command.
    const md = 'Intro.\n\n$$\nF = ma\n\\badcommand\n$$\n';
    const [p] = texProblems(md);
    expect(p.line).toBe(5);
    expect(p.message).toBe(katexSays('F = ma\n\\badcommand', true));
    expect(p.message).toContain('\\badcommand');
  });

  it('agrees with the renderer: every formula it flags is one the renderer marks as a KaTeX error', () => {
    const md = 'A $\\fra{1}{2}$ and a fine $a+b$.\n\n| col | col |\n|---|---|\n| $x^$ | y |\n';
    const problems = texProblems(md);
    expect(problems.map((p) => p.tex)).toEqual(['\\fra{1}{2}', 'x^']);
    // The renderer (rehype-katex, not throwing) shows both in its error colour: the unknown command in
    // place, the formula it cannot parse at all as a katex-error span.
    const html = renderMarkdown(md);
    expect(html).toMatch(/color:#A8782B;">\\fra</);
    expect(html).toMatch(/class="katex-error"[^>]*>x\^</);
  });

  it('leaves a dollar inside code alone', () => {
    expect(texProblems('Run `echo $x^$` in a shell.')).toEqual([]);
  });
});

describe('contentTexProblems', () => {
  it('keys the first problem of each Markdown field by its path', () => {
    const found = contentTexProblems({
      inBrief: 'Fine.',
      howItIsPitched: '',
      whyItFails: 'One $\\nope$.\nTwo $\\nah$.',
      whatFakesTheEffect: '',
      cautions: '',
      repliesAndAnswers: [{ reply: 'ok', answer: 'a\n$x^$' }],
    });
    expect(Object.keys(found)).toEqual(['whyItFails', 'repliesAndAnswers.0.answer']);
    expect(texProblemWords(found.whyItFails)).toBe(`line 1: KaTeX says ${katexSays('\\nope').replace(/\.$/, '')}`);
    expect(found['repliesAndAnswers.0.answer'].line).toBe(2);
  });
});
