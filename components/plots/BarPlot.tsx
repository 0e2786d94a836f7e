import { StyleSheet, Text, View } from 'react-native';
import Svg, { G, Line, Rect, Text as SvgText } from 'react-native-svg';
import type { BarPlot as BarPlotData } from '@/shared/checks/types';
import { formatQuantity } from '@/shared/worksheet/quantity';
import { colors, space, type } from '../theme';
import { axisTitle, makeAxis } from './axes';
import { LegendItem, PlotFrame, plotText, plotTitleText } from './PlotFrame';

type Role = NonNullable<BarPlotData['bars'][number]['role']>;

/** Teal for the claim, brass for the bound, graphite for the artifacts and anything else. */
const roleFill: Record<Role, string> = { claim: colors.teal, bound: colors.brass, artifact: colors.inkMuted };
const roleLegend: Record<Role, string> = { claim: 'The claim', bound: 'The bound', artifact: 'Artifacts' };
const fillFor = (role: Role | undefined) => (role ? roleFill[role] : colors.ink);

const side = 14;
const barHeight = 12;

/**
 * Figures side by side as horizontal bars, each labelled with its value, on a linear or (for
 * comparisons across orders of magnitude) logarithmic scale. A log scale has no zero: a bar at
 * zero or below is named but not drawn.
 */
export function BarPlot({ plot }: { plot: BarPlotData }) {
  const roles = (Object.keys(roleFill) as Role[]).filter((role) => plot.bars.some((b) => b.role === role));
  const shown = plot.bars.map((bar) => ({ ...bar, display: formatQuantity(bar.si, plot.unit) }));
  return (
    <PlotFrame
      testID={`plot-${plot.name}`}
      title={plot.title}
      description={
        `${plot.title}. Bars on a ${plot.yScale === 'log' ? 'logarithmic' : 'linear'} scale: ` +
        shown.map((b) => `${b.label} ${b.display}${b.role ? ` (${roleLegend[b.role].toLowerCase()})` : ''}`).join('; ') +
        '.'
      }
      legend={roles.map((role) => (
        <LegendItem key={role} label={roleLegend[role]} color={roleFill[role]} block />
      ))}
    >
      {(width) => {
        const values = plot.bars.map((b) => b.si);
        // A linear scale starts at zero, so that the lengths of the bars compare.
        const axis = makeAxis(plot.yScale, plot.yScale === 'log' ? values : [0, ...values], [side, width - side], Math.max(2, Math.floor(width / 90)));
        const start = plot.yScale === 'log' ? side : axis.at(0);
        const grid = axis.ticks.map((tick) => (
          <Line key={tick.value} x1={axis.at(tick.value)} x2={axis.at(tick.value)} y1={0} y2={barHeight + 4} stroke={colors.rule} strokeWidth={1} />
        ));
        return (
          <View style={styles.bars}>
            {shown.map((bar) => {
              const end = axis.at(bar.si);
              const drawn = Number.isFinite(end);
              return (
                <View key={bar.name} style={styles.bar}>
                  <View style={styles.barHead}>
                    <Text style={styles.barLabel}>{bar.label}</Text>
                    <Text testID={`plot-${plot.name}-value-${bar.name}`} style={type.mono}>
                      {bar.display}
                      {drawn ? '' : ' (not drawn: a log scale has no zero)'}
                    </Text>
                  </View>
                  <Svg width={width} height={barHeight + 4} aria-hidden>
                    {grid}
                    {drawn ? (
                      <Rect
                        testID={`plot-${plot.name}-bar-${bar.name}`}
                        x={Math.min(start, end)}
                        y={2}
                        width={Math.max(2, Math.abs(end - start))}
                        height={barHeight}
                        rx={2}
                        fill={fillFor(bar.role)}
                      />
                    ) : null}
                  </Svg>
                </View>
              );
            })}
            <Svg width={width} height={40} aria-hidden>
              <Line x1={side} x2={width - side} y1={1} y2={1} stroke={colors.ruleStrong} strokeWidth={1} />
              {axis.ticks.map((tick) => (
                <G key={tick.value}>
                  <Line x1={axis.at(tick.value)} x2={axis.at(tick.value)} y1={1} y2={5} stroke={colors.ruleStrong} strokeWidth={1} />
                  <SvgText x={axis.at(tick.value)} y={17} textAnchor="middle" {...plotText}>
                    {tick.label}
                  </SvgText>
                </G>
              ))}
              <SvgText x={width / 2} y={35} textAnchor="middle" {...plotTitleText}>
                {axisTitle('', plot.unit, axis)}
              </SvgText>
            </Svg>
          </View>
        );
      }}
    </PlotFrame>
  );
}

const styles = StyleSheet.create({
  bars: { gap: space.xs },
  bar: { gap: 2 },
  barHead: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', columnGap: space.sm },
  barLabel: { ...type.caption, color: colors.ink, flexShrink: 1 },
});
