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

const processor = unified()
  .use(remarkParse)
  .use(remarkGfm)
  .use(remarkMath)
  // Raw HTML in the Markdown is dropped here, never passed through.
  .use(remarkRehype)
  .use(rehypeSanitize, schema)
  // rehype-katex shows a TeX mistake in place (class `katex-error`) rather than failing the page.
  // A TeX mistake is shown in place in our brass (DESIGN.md §6), not KaTeX's default red.
  .use(rehypeKatex, { strict: 'ignore', errorColor: '#A8782B' })
  .use(rehypeStringify)
  .freeze();

/** Markdown with TeX math to sanitised HTML, synchronously; pure, in the browser and in Node. */
export function renderMarkdown(md: string): string {
  return String(processor.processSync(md));
}
