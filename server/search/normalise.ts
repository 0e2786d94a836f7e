/**
 * Our own simple English normalisation for the search index, applied alike to documents and
 * queries: lower case, diacritics stripped, a few stop words dropped, and a light suffix stemmer
 * (ours, not Porter's) that folds -s, -es, -ies, -ing, -ed, -ers, -ion and a final -e, so that
 * "microwaves", "microwave" and "microwaved" meet at "microwav".
 */
const STOP = new Set(
  'a an and are as at be by for from has have in into is it its of on or that the their there this to was were which with'.split(' '),
);

/**
 * Words too common in running prose to tell one machine from another, left out of long queries
 * such as a pasted claim (server/search/claim-match.ts), never out of the index or GET /api/search:
 * English function words, the stock phrases of abstracts, press releases and patent claims, and
 * the parts of web and mail addresses. Folded (lower case, no diacritics), before stemming.
 */
export const COMMON_WORDS = new Set(
  [
    // function words
    'about above across after again against all almost along also although always am among amongst any anyone anything',
    'around because been before being below beneath beside besides between beyond both but can cannot could did do does',
    'doing done down during each either else enough even ever every few further had hardly he hence her here hers herself',
    'him himself his how however i if indeed instead itself just least less let like many may me might mine more most',
    'much must my myself near neither never nevertheless no nobody none nor not nothing now of off often once one only onto',
    'other others otherwise our ours ourselves out over own per perhaps quite rather same several shall she should since so',
    'some somehow something sometimes still such than then thence thereby therefore these they thing things those though',
    'through throughout thus together too toward towards under unless until up upon us very via was we well were what',
    'whatever when whenever where whereas whether while who whoever whole whom whose why will within without would yet you',
    'your yours yourself yourselves',
    // numbers in words
    'two three four five six seven eight nine ten eleven twelve twenty thirty forty fifty hundred hundreds thousand',
    'thousands million millions billion',
    // stock phrases of abstracts, press releases and patent claims
    'according announced announce announces approach claim claimed claiming claims comprise comprised comprises comprising',
    'consisting describe described describes discuss discussed embodiment embodiments firm herein hereby paper present',
    'presented presents propose proposed proposes report reported reports respectively said say says show shown shows',
    'study suggest suggests thereof therein thereto today wherein whereby whereupon',
    // addresses
    'com contact details example http https info information mailto net org press www',
    // the common verbs, nouns and adjectives of running prose, which say nothing of a mechanism
    // (issue 11: "puts out", "takes in", "test point" must not carry a match; common practice, no source)
    'able again around came come comes coming day days gave get gets getting give given gives giving go goes going gone',
    'good got great hour hours keep keeps kept kind last likely long made make makes making measured minute minutes month',
    'months nearly new next part parts point points put puts putting result results saw see seen set sets setting take',
    'taken takes taking test tested testing tests time times took way ways week weeks went year years',
    // words of any claim of more out than in, or of any gadget, which name no mechanism (issue 12: with
    // an entry on excess heat from metal–hydrogen cells, "excess" alone must not carry a match)
    'excess surplus extra module modules unit units box boxes device devices prototype prototypes',
    'once twice place places placed half second third fourth small smaller hard harder first common',
    // (issue 11: a circuit "board" or a "run" of a test matched an entry titled "… splitting it on board":
    // words of any gadget's report, common practice, no source)
    'board boards back run runs running ran',
  ]
    .join(' ')
    .split(' '),
);

export function stem(word: string): string {
  let w = word;
  if (w.length > 4 && w.endsWith('ies')) return `${w.slice(0, -3)}y`;
  for (const suffix of ['ers', 'ing', 'ion', 'ed', 'es', 's']) {
    if (w.endsWith(suffix) && w.length - suffix.length >= 3) {
      if (suffix === 's' && /(ss|us|is)$/.test(w)) continue;
      w = w.slice(0, -suffix.length);
      break;
    }
  }
  if (w.length > 4 && w.endsWith('e')) w = w.slice(0, -1);
  return w;
}

export const fold = (s: string) => s.normalize('NFD').replace(/\p{M}+/gu, '').toLowerCase();

/** Words already normalised (most words recur: the index build, excerpts and queries look them up again). */
const TERMS = new Map<string, string | null>();
const TERMS_MAX = 200_000;

/** One term as the index sees it: null drops it. */
export function normaliseTerm(term: string): string | null {
  let out = TERMS.get(term);
  if (out !== undefined) return out;
  const t = fold(term).replace(/[^\p{L}\p{N}]+/gu, '');
  out = !t || STOP.has(t) ? null : stem(t);
  if (TERMS.size >= TERMS_MAX) TERMS.clear();
  TERMS.set(term, out);
  return out;
}

/** Markdown and TeX to plain text: math dropped, links kept as their words, markup removed. */
export function plainText(md: string): string {
  return md
    .replace(/\$\$[\s\S]*?\$\$/g, ' ')
    .replace(/\$[^$\n]+\$/g, ' ')
    .replace(/```[\s\S]*?```/g, ' ')
    .replace(/!?\[([^\]]*)\]\([^)]*\)/g, '$1')
    .replace(/<[^>]+>/g, ' ')
    .replace(/^\s{0,3}(#{1,6}|>|[-*+]|\d+\.)\s+/gm, '')
    .replace(/[*_`~|]+/g, '')
    .replace(/\s+/g, ' ')
    .trim();
}
