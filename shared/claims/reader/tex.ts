/**
 * TeX left in a pasted text (an abstract copied from a preprint, a manuscript's extracted text):
 * "$\eta = 0.42$", "F = 1.7 \times 10^{-6} N", "$T_h = 45$ °C", "44.7\,\%", "3\cdot10^4 W",
 * "5~\mu N". The reader reads the same text with the TeX written as people type it ("η = 0.42",
 * "1.7 × 10^-6 N", "44.7 %", "5 µN"), and every offset maps back to the pasted text, so a figure
 * still points at the words it was read from.
 *
 * Why our own table and not a package: the converters from TeX to Unicode on npm (and KaTeX, which
 * parses TeX to render it) give back a new string or a tree without where each character came
 * from; the reader needs that map. What is needed is a small table of the macros that appear
 * around figures (Greek letters for quantities, operators, spacing, units written as text), not a
 * TeX parser: anything not in it is left as it is.
 */

/** Macros written as one character (or none). Keys without the backslash. */
const MACROS: Record<string, string> = {
  times: '×',
  cdot: '·',
  pm: '±',
  mp: '∓',
  approx: '≈',
  simeq: '≈',
  sim: '~',
  leq: '≤',
  le: '≤',
  lesssim: '≤',
  geq: '≥',
  ge: '≥',
  gtrsim: '≥',
  ll: '≪',
  gg: '≫',
  to: '→',
  rightarrow: '→',
  infty: '∞',
  circ: '°',
  degree: '°',
  textdegree: '°',
  percent: '%',
  alpha: 'α',
  beta: 'β',
  gamma: 'γ',
  Gamma: 'Γ',
  delta: 'δ',
  Delta: 'Δ',
  epsilon: 'ε',
  varepsilon: 'ε',
  eta: 'η',
  theta: 'θ',
  lambda: 'λ',
  mu: 'µ',
  nu: 'ν',
  pi: 'π',
  rho: 'ρ',
  sigma: 'σ',
  tau: 'τ',
  phi: 'φ',
  varphi: 'φ',
  omega: 'ω',
  Omega: 'Ω',
  // Spacing.
  quad: ' ',
  qquad: ' ',
  // Wrappers whose argument is kept (the braces go with every group).
  mathrm: '',
  text: '',
  textrm: '',
  mathit: '',
  mathbf: '',
  textit: '',
  textbf: '',
  rm: '',
  mathsf: '',
  operatorname: '',
  left: '',
  right: '',
  displaystyle: '',
};

/** The signs that show a text carries TeX: a known macro, or a math group with a sub- or superscript group. */
const TEX_SIGN_RE = /\\[A-Za-z]+|\\[,;:!% ]|[\^_]\{|\$[^$\n]{1,200}\$/;

/** A `$…$` (or `$$…$$`) pair whose content reads as math: not "costs $2 and $3". */
const MATH_PAIR_RE = /\$\$?([^$\n]{1,200}?)\$\$?/g;
const MATH_CONTENT_RE = /[\\_^={}]|^[A-Za-z]$/;

export interface Detexed {
  /** The text with its TeX written as plain text. */
  text: string;
  /** For each offset of `text` (and one past its end), the offset in the pasted text it came from. */
  toPasted: number[];
}

/** The pasted text with its TeX written plainly and the offsets back, or null when it carries none. */
export function detex(pasted: string): Detexed | null {
  if (!TEX_SIGN_RE.test(pasted)) return null;
  // Dollar signs that open and close math (not prices).
  const dropped = new Set<number>();
  for (const m of pasted.matchAll(MATH_PAIR_RE)) {
    if (!MATH_CONTENT_RE.test(m[1].trim())) continue;
    const open = m[0].startsWith('$$') ? 2 : 1;
    const close = m[0].endsWith('$$') && m[0].length - open - m[1].length === 2 ? 2 : 1;
    for (let k = 0; k < open; k++) dropped.add(m.index + k);
    for (let k = 1; k <= close; k++) dropped.add(m.index + m[0].length - k);
  }
  let out = '';
  const map: number[] = [];
  const emit = (s: string, from: number) => {
    for (const ch of s) {
      for (let k = 0; k < ch.length; k++) map.push(from);
      out += ch;
    }
  };
  let i = 0;
  while (i < pasted.length) {
    const c = pasted[i];
    if (dropped.has(i)) {
      i++;
      continue;
    }
    if (c === '\\') {
      const word = /^[A-Za-z]+/.exec(pasted.slice(i + 1, i + 24))?.[0];
      if (word && word in MACROS) {
        let replacement = MACROS[word];
        let next = i + 1 + word.length;
        // "^\circ C" / "^{\circ}C": the degree sign takes no caret before it (dropped below) and no space after.
        if (replacement === '°') while (pasted[next] === ' ' || pasted[next] === '}') next++;
        // "\mu N", "\mu{}m": a prefix joined to its unit.
        if (replacement === 'µ') {
          while (pasted[next] === ' ' || pasted[next] === '{' || pasted[next] === '}' || pasted[next] === '~') next++;
          if (pasted.startsWith('\\,', next)) next += 2;
        }
        // "3\cdot 10^4": a product with a power of ten is the times sign.
        if (replacement === '·' && /^\s*10\s*\^/.test(pasted.slice(next))) replacement = '×';
        if (replacement === '°' && out.endsWith('^')) {
          out = out.slice(0, -1);
          map.pop();
        }
        emit(replacement, i);
        i = next;
        continue;
      }
      const sign = pasted[i + 1];
      if (sign === '%') {
        emit('%', i);
        i += 2;
        continue;
      }
      if (sign === ',' || sign === ';' || sign === ':' || sign === ' ') {
        emit(' ', i);
        i += 2;
        continue;
      }
      if (sign === '!') {
        i += 2;
        continue;
      }
      emit(c, i);
      i++;
      continue;
    }
    if (c === '{' || c === '}') {
      // "^{\circ}" is handled at the macro; a group's braces carry nothing a reader sees.
      if (c === '{' && out.endsWith('^') && pasted.startsWith('\\circ', i + 1)) {
        out = out.slice(0, -1);
        map.pop();
      }
      i++;
      continue;
    }
    emit(c, i);
    i++;
  }
  map.push(pasted.length);
  return out === pasted ? null : { text: out, toPasted: map };
}
