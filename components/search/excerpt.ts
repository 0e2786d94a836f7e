/** A search excerpt as plain text and marked text, read from the API's `<mark>` markup without ever rendering HTML. */
export interface ExcerptSegment {
  text: string;
  marked: boolean;
}

const ENTITIES: Record<string, string> = { amp: '&', lt: '<', gt: '>', quot: '"', apos: "'", nbsp: '\u00a0' };

/** Undoes the server's HTML escaping: named entities above and numeric ones (`&#39;`, `&#x2019;`). */
export function decodeEntities(text: string): string {
  return text.replace(/&(#x[0-9a-f]+|#[0-9]+|[a-z]+);/gi, (whole, name: string) => {
    if (name[0] === '#') {
      const code = name[1] === 'x' || name[1] === 'X' ? parseInt(name.slice(2), 16) : parseInt(name.slice(1), 10);
      return Number.isFinite(code) && code > 0 && code <= 0x10ffff ? String.fromCodePoint(code) : whole;
    }
    return ENTITIES[name.toLowerCase()] ?? whole;
  });
}

/**
 * Splits an excerpt into plain and marked segments: `a <mark>b</mark> c` → a, b (marked), c.
 * Any other tag is left as the text it is; a stray `<mark>` without its end marks the rest.
 */
export function parseExcerpt(excerpt: string): ExcerptSegment[] {
  const segments: ExcerptSegment[] = [];
  const push = (raw: string, marked: boolean) => {
    if (raw === '') return;
    const text = decodeEntities(raw);
    const last = segments[segments.length - 1];
    if (last && last.marked === marked) last.text += text;
    else segments.push({ text, marked });
  };
  let rest = excerpt;
  while (rest.length > 0) {
    const open = rest.search(/<mark>/i);
    if (open === -1) {
      push(rest, false);
      break;
    }
    push(rest.slice(0, open), false);
    rest = rest.slice(open + '<mark>'.length);
    const close = rest.search(/<\/mark>/i);
    if (close === -1) {
      push(rest, true);
      break;
    }
    push(rest.slice(0, close), true);
    rest = rest.slice(close + '</mark>'.length);
  }
  return segments;
}
