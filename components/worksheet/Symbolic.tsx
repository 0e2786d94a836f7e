/**
 * Variable names as symbols: a worksheet's `P_in` shows as P with the subscript "in", `eta` as η,
 * `eta_C` as η with the subscript C. Formulas (a step's expression, a check's condition) show each
 * name the worksheet defines as its symbol and leave functions, numbers and units as written.
 */
import { Fragment } from 'react';
import { StyleSheet, Text, type StyleProp, type TextStyle } from 'react-native';

/** Greek letters spelt out in identifiers (mathjs names cannot hold η). */
const GREEK: Record<string, string> = {
  alpha: 'α', beta: 'β', gamma: 'γ', delta: 'δ', epsilon: 'ε', zeta: 'ζ', eta: 'η', theta: 'θ', kappa: 'κ', lambda: 'λ',
  mu: 'μ', nu: 'ν', xi: 'ξ', pi: 'π', rho: 'ρ', sigma: 'σ', tau: 'τ', phi: 'φ', chi: 'χ', psi: 'ψ', omega: 'ω',
  Gamma: 'Γ', Delta: 'Δ', Theta: 'Θ', Lambda: 'Λ', Xi: 'Ξ', Pi: 'Π', Sigma: 'Σ', Phi: 'Φ', Psi: 'Ψ', Omega: 'Ω',
};

const greek = (s: string) => GREEK[s] ?? s;

/** An identifier as a symbol and its subscript: "P_in" → { base: "P", sub: "in" }, "eta" → { base: "η" }. */
export function symbolParts(name: string): { base: string; sub?: string } {
  const i = name.indexOf('_');
  if (i <= 0 || i === name.length - 1) return { base: greek(name) };
  return { base: greek(name.slice(0, i)), sub: name.slice(i + 1).split('_').map(greek).join(',') };
}

/** The symbol as plain text for a label or a screen reader: "P_in" → "P in", "eta" → "η". */
export function symbolText(name: string): string {
  const { base, sub } = symbolParts(name);
  return sub ? `${base} ${sub}` : base;
}

/** One variable as a symbol, its subscript lowered and smaller. */
export function VarSymbol({ name, style }: { name: string; style?: StyleProp<TextStyle> }) {
  const { base, sub } = symbolParts(name);
  // A letter is set in italics, as symbols for quantities are (SI Brochure §5.3); a word ("ratio") upright.
  return (
    <Text style={[[...base].length === 1 ? styles.symbol : null, style]} aria-label={symbolText(name)}>
      {base}
      {sub ? <Text style={styles.sub}>{sub}</Text> : null}
    </Text>
  );
}

const IDENTIFIER = /[A-Za-z_][A-Za-z0-9_]*/g;

/** A formula with the given names as symbols; anything else (functions, units, numbers) stays as written. */
export function Formula({ text, names, style, testID }: { text: string; names: ReadonlySet<string>; style?: StyleProp<TextStyle>; testID?: string }) {
  const parts: { text: string; symbol: boolean }[] = [];
  let last = 0;
  for (const m of text.matchAll(IDENTIFIER)) {
    const at = m.index ?? 0;
    if (!names.has(m[0])) continue;
    if (at > last) parts.push({ text: text.slice(last, at), symbol: false });
    parts.push({ text: m[0], symbol: true });
    last = at + m[0].length;
  }
  if (last < text.length) parts.push({ text: text.slice(last), symbol: false });
  return (
    <Text testID={testID} style={style}>
      {parts.map((p, i) => (p.symbol ? <VarSymbol key={i} name={p.text} /> : <Fragment key={i}>{p.text}</Fragment>))}
    </Text>
  );
}

/**
 * A worksheet's messages with its names labelled: "Input F: …" → "Claimed thrust (F): …", and
 * "input P" / "step F_bound" inside the text → "input “Input power”". Names not in `labels` stay.
 */
export function withLabels(message: string, labels: Readonly<Record<string, string>>): string {
  return message
    .replace(/^(Input|Step|Check|Plot) ([A-Za-z_][A-Za-z0-9_]*):/, (m, _kind: string, name: string) => (labels[name] ? `${labels[name]} (${symbolText(name)}):` : m))
    .replace(/\b(input|step|check|plot) ([A-Za-z_][A-Za-z0-9_]*)\b/g, (m, kind: string, name: string) => (labels[name] ? `${kind} “${labels[name]}”` : m));
}

const styles = StyleSheet.create({
  symbol: { fontStyle: 'italic' },
  sub: { fontSize: 11, lineHeight: 11, fontStyle: 'normal', position: 'relative', top: 3 },
});
