import { Fragment, useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { colors, radius, space, type } from '../theme';
import { Button } from '../ui/Button';

export interface PlacedFigure {
  id: string;
  text?: string;
  start?: number | null;
  end?: number | null;
}

type Piece = { kind: 'plain'; text: string } | { kind: 'figure'; id: string; text: string };

/**
 * The pasted text cut into plain runs and marked figures. A figure is marked only where its offsets
 * still point at its own words (text.slice(start, end) === figure.text); overlapping ones are skipped.
 */
export function piecesOf(text: string, figures: readonly PlacedFigure[]): Piece[] {
  const placed = figures
    .filter((f): f is PlacedFigure & { start: number; end: number; text: string } =>
      typeof f.start === 'number' && typeof f.end === 'number' && f.text !== undefined && f.end > f.start && text.slice(f.start, f.end) === f.text,
    )
    .sort((a, b) => a.start - b.start);
  const pieces: Piece[] = [];
  let at = 0;
  for (const f of placed) {
    if (f.start < at) continue;
    if (f.start > at) pieces.push({ kind: 'plain', text: text.slice(at, f.start) });
    pieces.push({ kind: 'figure', id: f.id, text: f.text });
    at = f.end;
  }
  if (at < text.length) pieces.push({ kind: 'plain', text: text.slice(at) });
  return pieces;
}

/** "Where in the text": the pasted text with each figure marked and labelled with its id, shown on request. */
export function WhereInText({ text, figures }: { text: string; figures: readonly PlacedFigure[] }) {
  const [open, setOpen] = useState(false);
  const pieces = piecesOf(text, figures);
  const marked = pieces.filter((p) => p.kind === 'figure').length;
  if (marked === 0) return null;
  return (
    <View style={styles.root}>
      <Button
        testID="claim-where-toggle"
        variant="quiet"
        label={open ? 'Hide where the figures are in the text' : `Show where the ${marked === 1 ? 'figure is' : `${marked} figures are`} in the text`}
        onPress={() => setOpen((o) => !o)}
      />
      {open ? (
        <Text testID="claim-where" selectable style={[type.body, styles.text]}>
          {pieces.map((p, i) =>
            p.kind === 'plain' ? (
              <Fragment key={i}>{p.text}</Fragment>
            ) : (
              <Text key={i} testID={`claim-where-${p.id}`} style={styles.mark}>
                {p.text}
                <Text style={styles.tag}> [{p.id}]</Text>
              </Text>
            ),
          )}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.sm, marginTop: space.sm },
  text: {
    backgroundColor: colors.surface,
    borderColor: colors.rule,
    borderWidth: 1,
    borderRadius: radius.sm,
    padding: space.sm,
  },
  mark: { backgroundColor: colors.brassWash, borderBottomColor: colors.brass, borderBottomWidth: 2, color: colors.ink },
  tag: { ...type.mono, fontSize: 12, color: colors.inkMuted },
});
