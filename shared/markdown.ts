/**
 * The one Markdown pipeline: what editors write (GitHub-flavoured Markdown with TeX math between
 * `$…$` and `$$…$$`) to HTML that is safe to put into a page. The Desk's preview, the entry page
 * and the server all render through it, so a reader sees what the editor saw.
 *
 * Order matters: the HTML is sanitised *before* KaTeX runs. The sanitiser keeps only what an editor
 * may write (no raw HTML at all, no script, no event handlers, no `javascript:` links) plus the
 * classes remark-math puts on math; KaTeX's own output, added afterwards, is trusted.
 */
import rehypeKatex from 'rehype-katex';
import rehypeSanitize, { defaultSchema, type Options as SanitizeSchema } from 'rehype-sanitize';
import rehypeStringify from 'rehype-stringify';
import remarkGfm from 'remark-gfm';
import remarkMath from 'remark-math';
import remarkParse from 'remark-parse';
import remarkRehype from 'remark-rehype';
import { unified } from 'unified';

/** GitHub's sanitising rules, and the math markers (`math-inline`, `math-display`) rehype-katex reads. */
const schema: SanitizeSchema = {
  ...defaultSchema,
  attributes: {
    ...defaultSchema.attributes,
    code: [['className', /^language-./, 'math-inline', 'math-display']],
  },
};

/** The few fields of an mdast node the display-math pass reads. */
interface MdNode {
  type: string;
  position?: { start: { offset?: number } };
  data?: { hProperties?: Record<string, unknown> };
  children?: MdNode[];
}

/**
 * `$$…$$` written inside a line (on one line, or within a paragraph) is display math, as in TeX:
 * remark-math parses it as inline math, so it is marked `math-display` here and KaTeX sets it in
 * display mode (centred, full size). A single `$…$` stays inline.
 */
function remarkDollarDisplay() {
  return (tree: MdNode, file: { value: unknown }) => {
    const source = String(file.value);
    const walk = (node: MdNode): void => {
      const start = node.position?.start.offset;
      if (node.type === 'inlineMath' && start !== undefined && source.startsWith('$$', start)) {
        node.data = { ...node.data, hProperties: { ...node.data?.hProperties, className: ['language-math', 'math-display'] } };
      }
      node.children?.forEach(walk);
    };
    walk(tree);
  };
}

const processor = unified()
  .use(remarkParse)
  .use(remarkGfm)
  .use(remarkMath)
  .use(remarkDollarDisplay)
  // Raw HTML in the Markdown is dropped here, never passed through.
  .use(remarkRehype)
  .use(rehypeSanitize, schema)
  // rehype-katex shows a TeX mistake in place (class `katex-error`) rather than failing the page.
  // A TeX mistake is shown in place in our brass (DESIGN.md §6), not KaTeX's default red.
  .use(rehypeKatex, { strict: 'ignore', errorColor: '#A8782B' })
  .use(rehypeStringify)
  .freeze();

/**
 * Emphasis delimiter runs (`*`, `_`, `**`…) one paragraph may use before the rest are taken as
 * literal characters. Resolving emphasis is quadratic in the runs of a paragraph (micromark matches
 * each closer against the openers before it): 8,000 unmatched runs took about 30 s on two cores,
 * 200 take a few milliseconds, and no real paragraph comes near.
 */
export const MAX_EMPHASIS_RUNS = 200;

/** A backslash escape, a code span, display or inline math (left alone), or a run of `*` / `_`. */
const TOKEN = /\\[\s\S]|`+[^`]*?`+|\$\$[\s\S]*?\$\$|\$[^$\n]*\$|\*+|_+/g;

/** Escapes the emphasis runs of each paragraph past MAX_EMPHASIS_RUNS; list markers and rules are kept. */
export function boundEmphasis(md: string): string {
  if ((md.match(/\*+|_+/g)?.length ?? 0) <= MAX_EMPHASIS_RUNS) return md;
  return md
    .split(/(\n[ \t]*\n)/)
    .map((block, i) => {
      if (i % 2 === 1) return block;
      let runs = 0;
      return block.replace(TOKEN, (tok, offset: number) => {
        if (tok[0] !== '*' && tok[0] !== '_') return tok;
        // At the start of a line (after indentation or quote marks) and followed by a space or the line's end: a list marker or a rule.
        const lineStart = block.lastIndexOf('\n', offset - 1) + 1;
        if (/^[ \t>]*$/.test(block.slice(lineStart, offset)) && /^([ \t]|\n|$)/.test(block.slice(offset + tok.length, offset + tok.length + 1))) return tok;
        runs += 1;
        return runs <= MAX_EMPHASIS_RUNS ? tok : tok.replace(/[*_]/g, '\\$&');
      });
    })
    .join('');
}

/** Markdown with TeX math to sanitised HTML, synchronously; pure, in the browser and in Node. */
export function renderMarkdown(md: string): string {
  return String(processor.processSync(boundEmphasis(md)));
}
