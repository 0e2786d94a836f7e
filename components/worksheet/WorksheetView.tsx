import { useEffect, useMemo } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { compileWorksheetWithKit } from '@/shared/compute';
import { CONSTANT_NAMES } from '@/shared/worksheet/constants';
import type { Worksheet } from '@/shared/worksheet/schema';
import type { PlotResult } from '@/shared/worksheet/types';
import { LinePlot, type LinePlotData } from '../plots/LinePlot';
import { space, type } from '../theme';
import { Notice } from '../ui/Notice';
import { Section } from '../ui/Screen';
import { QuantityField } from './QuantityField';
import { ResultList, ResultRow } from './ResultRow';
import { withLabels } from './Symbolic';
import { readableText } from '@/shared/format/numbers';
import { useTypedInputs } from './useTypedInputs';
import { Verdict } from './Verdict';

interface WorksheetViewProps {
  worksheet: Worksheet;
  /** Typed inputs to start from, e.g. from a permalink; the worksheet's defaults fill the rest. */
  initialValues?: Record<string, string>;
  /** Called with the settled inputs each time the reader has changed them. */
  onValuesChange?: (values: Record<string, string>) => void;
}

function asLinePlot(plot: PlotResult): LinePlotData {
  return { name: plot.name, title: plot.label, x: plot.x, series: plot.series, yScale: plot.yScale };
}

/**
 * A worksheet, live: its inputs editable in place, every step with its expression and value (or
 * the error at that step), its checks told in words, and its sweeps plotted. It is compiled once
 * and evaluated in the browser on every settled change.
 */
export function WorksheetView({ worksheet, initialValues = {}, onValuesChange }: WorksheetViewProps) {
  const compiled = useMemo(() => compileWorksheetWithKit(worksheet), [worksheet]);
  const { texts, setText, settled, touched } = useTypedInputs(worksheet.inputs, initialValues);
  const result = useMemo(() => compiled.evaluate(settled), [compiled, settled]);
  // Names shown as symbols in formulas, and labels for the names in messages.
  const symbols = useMemo(() => new Set([...worksheet.inputs.map((i) => i.name), ...worksheet.steps.map((s) => s.name), ...CONSTANT_NAMES]), [worksheet]);
  const labels = useMemo(
    () => Object.fromEntries([...worksheet.inputs, ...worksheet.steps, ...worksheet.checks].map((x) => [x.name, x.label])),
    [worksheet],
  );
  const say = (message: string | undefined) => (message === undefined ? undefined : withLabels(message, labels));

  useEffect(() => {
    if (touched) onValuesChange?.(settled);
  }, [touched, settled, onValuesChange]);

  const inputResult = new Map(result.inputs.map((r) => [r.name, r]));
  const stepResult = new Map(result.steps.map((r) => [r.name, r]));
  const checkResult = new Map(result.checks.map((r) => [r.name, r]));

  return (
    <View style={styles.root}>
      {worksheet.inputs.length > 0 ? (
        <Section title="Inputs">
          <View style={styles.fields}>
            {worksheet.inputs.map((input) => (
              <QuantityField
                key={input.name}
                name={input.name}
                label={input.label}
                showSymbol
                value={texts[input.name]}
                onChangeText={(text) => setText(input.name, text)}
                defaultText={input.default}
                unit={input.unit}
                difference={input.kind === 'difference'}
                help={input.help}
                error={say(inputResult.get(input.name)?.error?.message)}
                reading={inputResult.get(input.name)?.value?.display}
              />
            ))}
          </View>
        </Section>
      ) : null}
      {result.ok ? null : (
        <Text testID="worksheet-incomplete" style={[type.caption, styles.incomplete]}>
          Some values could not be computed; each says why where it stands.
        </Text>
      )}
      <Section title="Steps">
        <ResultList label="Steps">
          {worksheet.steps.map((step) => {
            const r = stepResult.get(step.name);
            return (
              <ResultRow
                key={step.name}
                testID={`step-${step.name}`}
                label={step.label}
                symbol={step.name}
                symbols={symbols}
                detail={`${step.name} = ${step.expression}`}
                value={r?.value}
                error={say(r?.error?.message)}
              />
            );
          })}
        </ResultList>
      </Section>
      {worksheet.checks.length > 0 ? (
        <Section title="Checks">
          <View style={styles.checks}>
            {worksheet.checks.map((check) => {
              const r = checkResult.get(check.name);
              return (
                <Verdict
                  key={check.name}
                  testID={`wcheck-${check.name}`}
                  holds={r?.holds}
                  title={check.label}
                  condition={check.condition}
                  symbols={symbols}
                  message={say(r?.message ?? r?.error?.message) ?? 'Not evaluated: fix the inputs or steps it depends on.'}
                />
              );
            })}
          </View>
        </Section>
      ) : null}
      {result.plots.length > 0 ? (
        <Section title="Plots">
          <View style={styles.checks}>
            {result.plots.map((plot) =>
              plot.error ? (
                <Notice key={plot.name} testID={`plot-${plot.name}-error`} title={`${plot.label}: not drawn`}>
                  {readableText(withLabels(plot.error.message, labels))}
                </Notice>
              ) : (
                <LinePlot key={plot.name} plot={asLinePlot(plot)} />
              ),
            )}
          </View>
        </Section>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.xs },
  fields: { gap: space.lg },
  checks: { gap: space.md },
  incomplete: { marginTop: space.lg },
});
