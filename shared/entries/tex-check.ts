/**
 * TeX that KaTeX cannot read, found before a draft goes to review. The Markdown is parsed by the same
 * remark pipeline as shared/markdown.ts (GFM, then remark-math), so a formula is found exactly where the
 * renderer would find one; each formula is then given to KaTeX's own parser with the renderer's options
 * and `throwOnError: true`. The Desk (to say why "Send for review" is blocked) and the server (to refuse
 * the submit with a 400 naming the field) both call it.
 */
import katex from 'katex';
import remarkGfm from 'remark-gfm';
import remarkMath from 'remark-math';
import remarkParse from 'remark-parse';
import { unified } from 'unified';
import type { EntryContent } from './schema';

export interface TexProblem {
  /** The line of the Markdown field (1 = its first line) where KaTeX stopped. */
  line: number;
  /** KaTeX's own words for what is wrong ("Undefined control sequence: \fra"). */
  message: string;
  /** The formula as written, without its dollar signs. */
  tex: string;
}

interface MathNode {
  type: string;
  value?: string;
  position?: { start: { line: number; offset?: number }; end: { offset?: number } };
  children?: MathNode[];
}

const parser = unified().use(remarkParse).use(remarkGfm).use(remarkMath).freeze();

function mathNodes(node: MathNode, out: MathNode[] = []): MathNode[] {
  if (node.type === 'math' || node.type === 'inlineMath') out.push(node);
  for (const child of node.children ?? []) mathNodes(child, out);
  return out;
}

/** KaTeX's ParseError carries its message without the "KaTeX parse error:" prefix and the offset in the formula. */
interface KatexParseError {
  rawMessage?: string;
  message: string;
  position?: number;
}

/** Each formula of a Markdown text that KaTeX cannot parse, in the order they appear. */
export function texProblems(markdown: string): TexProblem[] {
  if (!markdown.includes('$')) return [];
  const tree = parser.parse(markdown) as MathNode;
  const problems: TexProblem[] = [];
  for (const node of mathNodes(tree)) {
    const tex = node.value ?? '';
    const start = node.position?.start;
    const raw = start?.offset !== undefined && node.position?.end.offset !== undefined ? markdown.slice(start.offset, node.position.end.offset) : '';
    const displayMode = node.type === 'math' || raw.startsWith('$$');
    try {
      // The renderer's options (shared/markdown.ts: rehype-katex with strict 'ignore'), but throwing.
      katex.renderToString(tex, { displayMode, throwOnError: true, strict: 'ignore' });
    } catch (err) {
      const e = err as KatexParseError;
      // The line of the error: the formula's first line, plus the lines before it inside the formula.
      const at = raw.indexOf(tex);
      const before = (at >= 0 ? raw.slice(0, at) : '') + tex.slice(0, typeof e.position === 'number' ? e.position : 0);
      const line = (start?.line ?? 1) + (before.match(/\n/g)?.length ?? 0);
      problems.push({ line, message: (e.rawMessage ?? e.message).replace(/^KaTeX parse error:\s*/, ''), tex });
    }
  }
  return problems;
}

/** The Markdown fields of an entry that may hold TeX, by their path in the content ("repliesAndAnswers.0.answer"). */
export function markdownFields(content: Pick<EntryContent, 'inBrief' | 'howItIsPitched' | 'whyItFails' | 'whatFakesTheEffect' | 'cautions' | 'repliesAndAnswers'>): [string, string][] {
  return [
    ['inBrief', content.inBrief],
    ['howItIsPitched', content.howItIsPitched],
    ['whyItFails', content.whyItFails],
    ['whatFakesTheEffect', content.whatFakesTheEffect ?? ''],
    ['cautions', content.cautions ?? ''],
    ...(content.repliesAndAnswers ?? []).flatMap((r, i): [string, string][] => [
      [`repliesAndAnswers.${i}.reply`, r.reply],
      [`repliesAndAnswers.${i}.answer`, r.answer],
    ]),
  ];
}

/** The first TeX problem of each Markdown field of an entry, keyed by the field's path. */
export function contentTexProblems(content: Parameters<typeof markdownFields>[0]): Record<string, TexProblem> {
  const found: Record<string, TexProblem> = {};
  for (const [path, text] of markdownFields(content)) {
    const [first] = texProblems(text ?? '');
    if (first) found[path] = first;
  }
  return found;
}

/** "line 4: KaTeX says Undefined control sequence: \fra" — the words a 400 and the editor use. */
export const texProblemWords = (p: TexProblem) => `line ${p.line}: KaTeX says ${p.message.replace(/\.$/, '')}`;
