import type { CheckPlot } from '@/shared/checks/types';
import { BarPlot } from './BarPlot';
import { LinePlot } from './LinePlot';

/** Whatever a check returns to be seen: a line plot or bars. */
export function PlotView({ plot }: { plot: CheckPlot }) {
  return plot.kind === 'bars' ? <BarPlot plot={plot} /> : <LinePlot plot={plot} />;
}
