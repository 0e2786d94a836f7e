import { useState, type ReactNode } from 'react';
import { StyleSheet, Text, useWindowDimensions, View, type LayoutChangeEvent } from 'react-native';
import Svg, { Line } from 'react-native-svg';
import { colors, layout, radius, space, type } from '../theme';

/**
 * How each series or bar is drawn: teal for the claim or the first series, brass for the bound
 * or the second, graphite for the rest; lines also differ by dash so that colour is never the
 * only cue.
 */
const seriesStyles = [
  { stroke: colors.teal, dash: undefined },
  { stroke: colors.brass, dash: '6 4' },
  { stroke: colors.ink, dash: '2 3' },
  { stroke: colors.inkMuted, dash: '8 3 2 3' },
  { stroke: colors.ink, dash: '10 4' },
  { stroke: colors.inkMuted, dash: undefined },
] as const;

export function seriesStyle(index: number) {
  return seriesStyles[index % seriesStyles.length];
}

/** Tick labels and axis titles inside the drawings. */
export const plotText = { fontFamily: type.mono.fontFamily, fontSize: 11, fill: colors.inkMuted } as const;
export const plotTitleText = { fontFamily: type.small.fontFamily, fontSize: 12, fill: colors.ink } as const;

const framePadding = space.sm;

interface PlotFrameProps {
  testID: string;
  title: string;
  /** What the plot shows, in words, for readers who cannot see it. */
  description: string;
  legend: ReactNode;
  /** Draws the plot for the width it is given. */
  children: (width: number) => ReactNode;
}

/** The card every plot sits in: its title, the drawing at the width available, and a legend. */
export function PlotFrame({ testID, title, description, legend, children }: PlotFrameProps) {
  const window = useWindowDimensions();
  // Until the first layout, a guess from the window: the reading column less the page padding.
  const [width, setWidth] = useState(() =>
    Math.max(240, Math.min(window.width - 2 * space.md, layout.contentMaxWidth) - 2 * framePadding - 2),
  );
  const onLayout = (event: LayoutChangeEvent) => {
    const measured = Math.floor(event.nativeEvent.layout.width);
    if (measured > 0 && measured !== width) setWidth(measured);
  };
  return (
    <View testID={testID} role="img" aria-label={description} style={styles.frame}>
      <Text style={type.uiStrong}>{title}</Text>
      <View onLayout={onLayout} style={styles.drawing}>
        {children(width)}
      </View>
      <View style={styles.legend}>{legend}</View>
    </View>
  );
}

interface LegendItemProps {
  label: string;
  color: string;
  /** A line sample with this dash pattern, or a solid block (bars) when `block`. */
  dash?: string;
  block?: boolean;
}

/** One legend entry: a short sample of the line (or a block of the bar colour) and its words. */
export function LegendItem({ label, color, dash, block }: LegendItemProps) {
  return (
    <View style={styles.legendItem}>
      <Svg width={24} height={12} aria-hidden>
        <Line x1={1} y1={6} x2={23} y2={6} stroke={color} strokeWidth={block ? 10 : 2} strokeDasharray={dash} />
      </Svg>
      <Text style={type.caption}>{label}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  frame: {
    gap: space.xs,
    backgroundColor: colors.surface,
    borderColor: colors.rule,
    borderWidth: 1,
    borderRadius: radius.md,
    padding: framePadding,
  },
  drawing: { width: '100%', overflow: 'hidden' },
  legend: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.md, rowGap: space.xxs },
  legendItem: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
});
