import { line } from 'd3-shape';
import Svg, { G, Line, Path, Text as SvgText } from 'react-native-svg';
import { colors } from '../theme';
import { axisTitle, extent, finiteValues, formatNumber, makeAxis, type Axis, type ScaleKind } from './axes';
import { LegendItem, PlotFrame, plotText, plotTitleText, seriesStyle } from './PlotFrame';

export interface LineSeriesData {
  name: string;
  label: string;
  unit: string;
  /** One value per x; null (or NaN) where there is none, drawn as a gap. */
  values: ArrayLike<number | null>;
}

/** What a line plot needs: a check's LinePlot fits as it is; a worksheet sweep maps onto it. */
export interface LinePlotData {
  name: string;
  title: string;
  x: { label: string; unit: string; values: ArrayLike<number>; scale?: ScaleKind };
  series: LineSeriesData[];
  yScale: ScaleKind;
}

interface Panel {
  unit: string;
  series: { data: LineSeriesData; index: number }[];
}

/** Series in different units cannot share a y axis: each unit gets its own panel, all on one x axis. */
function panelsByUnit(series: LineSeriesData[]): Panel[] {
  const panels: Panel[] = [];
  series.forEach((data, index) => {
    const panel = panels.find((p) => p.unit === data.unit);
    if (panel) panel.series.push({ data, index });
    else panels.push({ unit: data.unit, series: [{ data, index }] });
  });
  return panels;
}

const margin = { left: 58, right: 16 };
const panelTitleHeight = 22;
const panelGap = 14;
const xAxisHeight = 46;
/** IBM Plex Mono's advance is 0.6 em: enough to keep tick labels inside the drawing. */
const charWidth = plotText.fontSize * 0.6;

/**
 * Several series against one x: a single panel when they share a unit, otherwise one small panel
 * per unit stacked over a shared x axis. Linear or logarithmic y; gaps where a value is missing.
 */
export function LinePlot({ plot }: { plot: LinePlotData }) {
  const panels = panelsByUnit(plot.series);
  return (
    <PlotFrame
      testID={`plot-${plot.name}`}
      title={plot.title}
      description={describeLinePlot(plot, panels.length)}
      legend={plot.series.map((s, i) => (
        <LegendItem
          key={s.name}
          label={s.unit ? `${s.label} (${s.unit})` : s.label}
          color={seriesStyle(i).stroke}
          dash={seriesStyle(i).dash}
        />
      ))}
    >
      {(width) => <LineDrawing plot={plot} panels={panels} width={width} />}
    </PlotFrame>
  );
}

function LineDrawing({ plot, panels, width }: { plot: LinePlotData; panels: Panel[]; width: number }) {
  const xKind = plot.x.scale ?? 'linear';
  const xs = Array.from(plot.x.values);
  const right = width - margin.right;
  const xTicks = Math.max(2, Math.floor((right - margin.left) / 80));
  const xAxis = makeAxis(xKind, finiteValues(xs, xKind === 'log'), [margin.left, right], xTicks, false);
  const plotHeight = panels.length === 1 ? 180 : 96;
  const panelTop = (p: number) => p * (panelTitleHeight + plotHeight + panelGap) + panelTitleHeight;
  const lastBottom = panelTop(panels.length - 1) + plotHeight;

  return (
    <Svg width={width} height={lastBottom + xAxisHeight} aria-hidden>
      {panels.map((panel, p) => {
        const top = panelTop(p);
        const bottom = top + plotHeight;
        const values = panel.series.flatMap((s) => finiteValues(s.data.values, plot.yScale === 'log'));
        const yAxis = makeAxis(plot.yScale, values, [bottom, top], panels.length === 1 ? 5 : 3);
        // One series: its name and unit. Several: the unit alone, the legend names them.
        const label = panel.series.length === 1 ? panel.series[0].data.label : '';
        return (
          <G key={panel.unit}>
            <SvgText x={0} y={top - 8} {...plotTitleText}>
              {fitText(axisTitle(label, panel.unit, yAxis), width)}
            </SvgText>
            {yAxis.ticks.map((tick) => (
              <G key={tick.value}>
                <Line x1={margin.left} x2={right} y1={yAxis.at(tick.value)} y2={yAxis.at(tick.value)} stroke={colors.rule} strokeWidth={1} />
                <SvgText x={margin.left - 6} y={yAxis.at(tick.value) + 4} textAnchor="end" {...plotText}>
                  {tick.label}
                </SvgText>
              </G>
            ))}
            {xAxis.ticks.map((tick) => (
              <Line key={tick.value} x1={xAxis.at(tick.value)} x2={xAxis.at(tick.value)} y1={top} y2={bottom} stroke={colors.rule} strokeWidth={1} />
            ))}
            <Line x1={margin.left} x2={right} y1={bottom} y2={bottom} stroke={colors.ruleStrong} strokeWidth={1} />
            {panel.series.map(({ data, index }) => (
              <Path
                key={data.name}
                testID={`plot-${plot.name}-series-${data.name}`}
                d={seriesPath(xs, data.values, xAxis, yAxis)}
                fill="none"
                stroke={seriesStyle(index).stroke}
                strokeDasharray={seriesStyle(index).dash}
                strokeWidth={2}
              />
            ))}
          </G>
        );
      })}
      {xAxis.ticks.map((tick) => {
        const x = xAxis.at(tick.value);
        const half = (tick.label.length * charWidth) / 2;
        const anchor = x + half > width ? 'end' : x - half < 0 ? 'start' : 'middle';
        return (
          <G key={tick.value}>
            <Line x1={x} x2={x} y1={lastBottom} y2={lastBottom + 4} stroke={colors.ruleStrong} strokeWidth={1} />
            <SvgText x={x} y={lastBottom + 17} textAnchor={anchor} {...plotText}>
              {tick.label}
            </SvgText>
          </G>
        );
      })}
      <SvgText x={(margin.left + right) / 2} y={lastBottom + 38} textAnchor="middle" {...plotTitleText}>
        {fitText(axisTitle(plot.x.label, plot.x.unit, xAxis), right - margin.left)}
      </SvgText>
    </Svg>
  );
}

/** Shortens an axis title that would run past `width` (IBM Plex Sans averages about 0.55 em). */
function fitText(text: string, width: number): string {
  const room = Math.floor(width / (plotTitleText.fontSize * 0.55));
  return text.length <= room ? text : `${text.slice(0, Math.max(1, room - 1))}…`;
}

function seriesPath(xs: number[], values: ArrayLike<number | null>, xAxis: Axis, yAxis: Axis): string {
  const n = Math.min(xs.length, values.length);
  const points: [number, number][] = [];
  for (let i = 0; i < n; i += 1) {
    const v = values[i];
    points.push([xAxis.at(xs[i]), v === null ? NaN : yAxis.at(v)]);
  }
  const draw = line<[number, number]>().defined(([x, y]) => Number.isFinite(x) && Number.isFinite(y));
  return draw(points) ?? '';
}

function describeLinePlot(plot: LinePlotData, panelCount: number): string {
  const xs = finiteValues(plot.x.values);
  const unit = (u: string) => (u ? ` ${u}` : '');
  const parts = [
    `${plot.title}. Line plot of ${plot.series.map((s) => s.label).join(', ')} against ${plot.x.label}` +
      (xs.length ? ` from ${formatNumber(xs[0])} to ${formatNumber(xs[xs.length - 1])}${unit(plot.x.unit)}` : '') +
      (panelCount > 1 ? ', one panel per unit' : '') +
      (plot.yScale === 'log' ? ', on a logarithmic scale' : '') +
      '.',
  ];
  for (const s of plot.series) {
    const v = finiteValues(s.values);
    if (!v.length) {
      parts.push(`${s.label}: no values.`);
      continue;
    }
    const [lo, hi] = extent(v);
    parts.push(
      `${s.label} goes from ${formatNumber(v[0])} to ${formatNumber(v[v.length - 1])}${unit(s.unit)}, ` +
        `between ${formatNumber(lo)} and ${formatNumber(hi)}.`,
    );
  }
  return parts.join(' ');
}
