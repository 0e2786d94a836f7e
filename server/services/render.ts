/**
 * The HTML of a version's Markdown sections, through the one pipeline the client uses
 * (shared/markdown.ts: remark → sanitise → KaTeX). A published version never changes, so its HTML
 * is kept (a bounded cache keyed by version id).
 */
import type { EntryContent } from '../../shared/entries/schema';
import { renderMarkdown } from '../../shared/markdown';
import type { EntryHtml } from '../../shared/api-types';

const MAX = 500;

export function renderContent(content: EntryContent): EntryHtml {
  const r = (s: string) => (s ? renderMarkdown(s) : '');
  return {
    inBrief: r(content.inBrief),
    howItIsPitched: r(content.howItIsPitched),
    whyItFails: r(content.whyItFails),
    whatFakesTheEffect: r(content.whatFakesTheEffect),
    cautions: r(content.cautions),
    replies: content.repliesAndAnswers.map((x) => ({ reply: r(x.reply), answer: r(x.answer) })),
  };
}

/** For published versions only (their content never changes); `cache` belongs to one app. */
export function renderHtml(cache: Map<number, EntryHtml>, versionId: number, content: EntryContent): EntryHtml {
  const hit = cache.get(versionId);
  if (hit) return hit;
  const html = renderContent(content);
  if (cache.size >= MAX) cache.delete(cache.keys().next().value!);
  cache.set(versionId, html);
  return html;
}
