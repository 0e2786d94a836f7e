import { useMemo } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { checkList, checks } from '@/shared/checks';
import { CheckInputError, isCheckName, runCheck, type CheckRun } from '@/shared/checks/run';
import type { CheckDefinition } from '@/shared/checks/types';
import { PlotView } from '../plots/PlotView';
import { space, type } from '../theme';
import { Notice } from '../ui/Notice';
import { Screen, Section } from '../ui/Screen';
import { BackLink } from '../worksheet/BackLink';
import { Permalink, useAddressSync } from '../worksheet/permalink';
import { QuantityField } from '../worksheet/QuantityField';
import { ResultList, ResultRow } from '../worksheet/ResultRow';
import { useTypedInputs } from '../worksheet/useTypedInputs';
import { Verdict } from '../worksheet/Verdict';

interface CheckScreenProps {
  /** The check's name from the address, which may name no check at all. */
  name: string;
  /** The address's query: typed inputs by name. */
  query: Record<string, string>;
}

/** One check of the kit: the claim's figures in, the verdict in words and the numbers out, live. */
export function CheckScreen({ name, query }: CheckScreenProps) {
  if (!isCheckName(name)) return <UnknownCheck name={name} />;
  return <KnownCheck key={name} def={checks[name]} query={query} />;
}

type Outcome =
  | { kind: 'run'; run: CheckRun }
  | { kind: 'invalid'; fields: Record<string, string> }
  | { kind: 'failed'; message: string };

function attempt(def: CheckDefinition, texts: Record<string, string>): Outcome {
  try {
    return { kind: 'run', run: runCheck(def.name, texts) };
  } catch (err) {
    if (err instanceof CheckInputError) return { kind: 'invalid', fields: err.fields };
    return { kind: 'failed', message: err instanceof Error ? err.message : String(err) };
  }
}

function KnownCheck({ def, query }: { def: CheckDefinition; query: Record<string, string> }) {
  const { texts, setText, settled, touched } = useTypedInputs(def.inputs, query);
  useAddressSync(touched ? settled : undefined);
  const outcome = useMemo(() => attempt(def, settled), [def, settled]);
  const fieldError = (input: string) => (outcome.kind === 'invalid' ? outcome.fields[`inputs.${input}`] : undefined);
  const read = (input: string) => (outcome.kind === 'run' ? outcome.run.inputs[input]?.display : undefined);

  return (
    <Screen testID={`screen-check-${def.name}`} title={def.title} lead={def.summary}>
      <View style={styles.condition}>
        <Text style={type.caption}>The verdict says whether this holds</Text>
        <Text style={styles.conditionText}>{def.condition}</Text>
      </View>
      {def.cautions.length > 0 ? (
        <Notice tone="warning" testID="check-cautions" title="Safety first">
          {['This check touches work that can hurt people. Local codes and licensed practice come first.', ...def.cautions].join('\n\n')}
        </Notice>
      ) : null}
      <Section title="The claim's figures">
        <View style={styles.fields}>
          {def.inputs.map((spec) => (
            <QuantityField
              key={spec.name}
              name={spec.name}
              label={spec.label}
              value={texts[spec.name]}
              onChangeText={(text) => setText(spec.name, text)}
              defaultText={spec.default}
              unit={spec.unit}
              difference={spec.kind === 'difference'}
              help={spec.help}
              presets={spec.presets}
              error={fieldError(spec.name)}
              reading={read(spec.name)}
            />
          ))}
        </View>
      </Section>
      <Section title="Result">
        <Result def={def} outcome={outcome} />
      </Section>
      <Permalink values={settled} />
      <BackLink testID="check-back" />
    </Screen>
  );
}

function Result({ def, outcome }: { def: CheckDefinition; outcome: Outcome }) {
  if (outcome.kind === 'failed') {
    return (
      <Notice role="alert" testID="check-failed" title="The check could not be run on these figures.">
        {outcome.message} Change a figure and it runs again; if this keeps happening, report it with this message.
      </Notice>
    );
  }
  if (outcome.kind === 'invalid') {
    const names = new Set(def.inputs.map((spec) => `inputs.${spec.name}`));
    const elsewhere = Object.entries(outcome.fields).filter(([key]) => !names.has(key));
    return (
      <Notice testID="check-invalid" title="No result until the marked figures are put right.">
        {elsewhere.length
          ? elsewhere.map(([, message]) => message).join(' ')
          : 'Each marked field says what it needs; the result appears as soon as every figure can be read.'}
      </Notice>
    );
  }
  const { run } = outcome;
  return (
    <View style={styles.result}>
      <Verdict testID="verdict" holds={run.verdict.holds} condition={def.condition} message={run.verdict.message} />
      <ResultList label="Computed figures">
        {run.outputs.map((output) => (
          <ResultRow key={output.name} testID={`output-${output.name}`} label={output.label} value={output} />
        ))}
      </ResultList>
      {run.plots.map((plot) => (
        <PlotView key={plot.name} plot={plot} />
      ))}
    </View>
  );
}

function UnknownCheck({ name }: { name: string }) {
  return (
    <Screen testID="screen-check-not-found" title="No such check">
      <Text style={type.reading}>
        The kit has no check called <Text style={styles.mono}>{name}</Text>. It has {checkList.length}:{' '}
        {checkList.map((c) => c.title).join('; ')}.
      </Text>
      <BackLink testID="check-not-found-back" label="See all the checks" />
    </Screen>
  );
}

const styles = StyleSheet.create({
  condition: { gap: space.xxs },
  conditionText: { ...type.mono, fontSize: 16, lineHeight: 24 },
  fields: { gap: space.lg },
  result: { gap: space.md },
  mono: { ...type.mono, fontSize: 16 },
});
