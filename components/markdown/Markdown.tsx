import { useInsertionEffect } from 'react';
import { unstable_createElement } from 'react-native-web';
import { colors, fonts, radius, space, type } from '../theme';

interface MarkdownProps {
  /** HTML from shared/markdown.ts (renderMarkdown), already sanitised. */
  html: string;
  testID?: string;
  /** `compact` for short passages set in the body size (replies, notices); `reading` otherwise. */
  size?: 'reading' | 'compact';
}

const CLASS = 'cw-md';

/**
 * The elements editors' Markdown can produce, in the reading face and the app's tokens. White space
 * is collapsed as in any web page (a single newline in the source is a space, even where the passage
 * sits inside a react-native-web Text, which would keep it); display math is a centred block.
 */
const css = `
.${CLASS}{font-family:${fonts.serif};color:${colors.ink};overflow-wrap:anywhere;white-space:normal}
.${CLASS}.reading{font-size:${type.reading.fontSize}px;line-height:${type.reading.lineHeight}px}
.${CLASS}.compact{font-size:${type.body.fontSize}px;line-height:${type.body.lineHeight}px}
.${CLASS}>:first-child{margin-top:0}
.${CLASS}>:last-child{margin-bottom:0}
.${CLASS} p,.${CLASS} ul,.${CLASS} ol,.${CLASS} blockquote,.${CLASS} table,.${CLASS} pre{margin:0 0 ${space.sm}px}
.${CLASS} strong{font-family:${fonts.serifSemiBold};font-weight:normal}
.${CLASS} a{color:${colors.teal};text-decoration:underline}
.${CLASS} a:focus-visible{outline:2px solid ${colors.brass};outline-offset:2px}
.${CLASS} code{font-family:${fonts.mono};font-size:0.85em;background:${colors.paperDeep};border-radius:${radius.sm}px;padding:0 ${space.xxs}px}
.${CLASS} pre{background:${colors.paperDeep};border-radius:${radius.sm}px;padding:${space.sm}px;overflow-x:auto;white-space:pre}
.${CLASS} pre code{padding:0;background:none}
.${CLASS} blockquote{border-left:3px solid ${colors.rule};padding-left:${space.md}px;color:${colors.inkMuted}}
.${CLASS} table{border-collapse:collapse;display:block;overflow-x:auto}
.${CLASS} th,.${CLASS} td{border:1px solid ${colors.rule};padding:${space.xxs}px ${space.xs}px;text-align:left}
.${CLASS} th{font-family:${fonts.sansSemiBold};font-weight:normal;background:${colors.paperDeep}}
.${CLASS} .katex-display{display:block;text-align:center;margin:${space.sm}px 0;overflow-x:auto;overflow-y:hidden;padding:${space.xxs}px 0}
.${CLASS} .katex-error{color:${colors.brass}}
`;

/** Puts the stylesheet into the document once, however many passages are on the page. */
function useMarkdownStyles() {
  useInsertionEffect(() => {
    if (document.getElementById('cw-markdown-styles')) return;
    const style = document.createElement('style');
    style.id = 'cw-markdown-styles';
    style.textContent = css;
    document.head.appendChild(style);
  }, []);
}

/**
 * A passage of editors' Markdown, rendered to HTML by the one pipeline (shared/markdown.ts), with
 * its TeX set by KaTeX. The HTML is sanitised before it gets here; this only places it in the page.
 */
export function Markdown({ html, testID, size = 'reading' }: MarkdownProps) {
  useMarkdownStyles();
  return unstable_createElement('div', {
    className: `${CLASS} ${size}`,
    testID,
    dangerouslySetInnerHTML: { __html: html },
  });
}
