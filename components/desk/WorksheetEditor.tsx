import { useEffect, useMemo, useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { compileWorksheetWithKit } from '@/shared/compute';
import { ourWords } from '@/shared/schemas/drafts';
import { worksheetSchema, type Worksheet } from '@/shared/worksheet/schema';
import type { WorksheetResult } from '@/shared/worksheet/types';
import { colors, space, type } from '../theme';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { FieldError } from '../worksheet/QuantityField';
import { withLabels } from '../worksheet/Symbolic';
import { WorksheetView } from '../worksheet/WorksheetView';
import { EditorField } from './EditorField';
import { asSentence } from './editorValues';

/** At most this many worksheets to an entry (the entry schema's limit). */
const MAX_WORKSHEETS = 6;

type Group = 'inputs' | 'steps' | 'checks';
type Row = Record<string, string | undefined>;

interface FieldSpec {
  field: string;
  label: string;
  optional?: boolean;
  mono?: boolean;
  lines?: number;
}

/** The rows of a worksheet, each field a text field; optional fields left empty are left out. */
const groups: { group: Group; key: 'input' | 'step' | 'check'; title: string; addLabel: string; fields: FieldSpec[]; blank: () => Row }[] = [
  {
    group: 'inputs',
    key: 'input',
    title: 'Inputs',
    addLabel: 'Add an input',
    fields: [
      { field: 'name', label: 'Name', mono: true },
      { field: 'label', label: 'Label' },
      { field: 'unit', label: 'Unit ("" for a pure number)', mono: true },
      { field: 'default', label: 'Default', mono: true },
      { field: 'kind', label: 'Kind (optional): "difference" for a rise or a ΔT, so that 2 degC reads as 2 K', optional: true, mono: true },
      { field: 'min', label: 'Least value (optional)', optional: true, mono: true },
      { field: 'max', label: 'Greatest value (optional)', optional: true, mono: true },
      { field: 'help', label: 'Help (optional)', optional: true, lines: 2 },
    ],
    blank: () => ({ name: '', label: '', unit: '', default: '' }),
  },
  {
    group: 'steps',
    key: 'step',
    title: 'Steps',
    addLabel: 'Add a step',
    fields: [
      { field: 'name', label: 'Name', mono: true },
      { field: 'label', label: 'Label' },
      { field: 'expression', label: 'Expression', mono: true, lines: 2 },
      { field: 'unit', label: 'Unit to show (optional)', optional: true, mono: true },
      { field: 'help', label: 'Help (optional)', optional: true, lines: 2 },
    ],
    blank: () => ({ name: '', label: '', expression: '' }),
  },
  {
    group: 'checks',
    key: 'check',
    title: 'Checks',
    addLabel: 'Add a check',
    fields: [
      { field: 'name', label: 'Name', mono: true },
      { field: 'label', label: 'Label' },
      { field: 'condition', label: 'Condition', mono: true, lines: 2 },
      { field: 'holds', label: 'Message when it holds', lines: 2 },
      { field: 'fails', label: 'Message when it fails', lines: 2 },
    ],
    blank: () => ({ name: '', label: '', condition: '', holds: '', fails: '' }),
  },
];

export const blankWorksheet = (): Worksheet => ({ name: '', title: '', inputs: [], steps: [], checks: [], plots: [] });

/** The schema's problems with one worksheet, by path: "steps.1.expression" → its message (the first one). */
function problemsOf(ws: Worksheet): Map<string, string> {
  const problems = new Map<string, string>();
  // In our words (ourWords), never zod's defaults, as sentences like the rest of the editor's.
  const result = worksheetSchema.safeParse(ws, { error: ourWords });
  if (!result.success) {
    for (const issue of result.error.issues) {
      const key = issue.path.map(String).join('.');
      if (!problems.has(key)) problems.set(key, asSentence(issue.message));
    }
  }
  return problems;
}

/**
 * What of a worksheet can run while it is being written: the rows without problems (a half-written
 * check does not stop the steps running), if what is left passes the schema.
 */
function runnable(ws: Worksheet, problems: Map<string, string>): Worksheet | undefined {
  const bad = (group: string, i: number) => [...problems.keys()].some((key) => key.startsWith(`${group}.${i}.`) || key === `${group}.${i}`);
  const plotsBad = [...problems.keys()].some((key) => key.startsWith('plots'));
  const candidate: Worksheet = {
    ...ws,
    inputs: ws.inputs.filter((_, i) => !bad('inputs', i)),
    steps: ws.steps.filter((_, i) => !bad('steps', i)),
    checks: ws.checks.filter((_, i) => !bad('checks', i)),
    plots: plotsBad ? [] : ws.plots,
  };
  const result = worksheetSchema.safeParse(candidate);
  return result.success ? result.data : undefined;
}

interface WorksheetEditorProps {
  /** The entry's worksheets, in the shape the draft saves; emitted whole on every edit. */
  value: Worksheet[];
  onChange: (worksheets: Worksheet[]) => void;
  /** A problem with the worksheets as a whole, from the entry's checks. */
  error?: string;
  /** The section's heading. */
  label?: string;
}

/**
 * The worksheets of an entry, edited as a form: each worksheet's inputs, steps and checks as rows
 * of text fields, checked as they are typed by the schema the server uses (each problem beside
 * its field), and run live beneath.
 */
export function WorksheetEditor({ value, onChange, error, label = 'Worksheets' }: WorksheetEditorProps) {
  const update = (i: number) => (next: Worksheet) => onChange(value.map((ws, k) => (k === i ? next : ws)));
  return (
    <View testID="worksheet-editor" style={styles.root}>
      <Text style={type.uiStrong}>{label}</Text>
      <Text style={type.small}>
        Inputs with units and defaults, steps computed from them in the mathjs expression language with units, and checks
        that hold or fail. Each runs below as readers will use it.
      </Text>
      {value.map((ws, i) => (
        <WorksheetForm
          key={i}
          index={i}
          worksheet={ws}
          onChange={update(i)}
          onRemove={() => onChange(value.filter((_, k) => k !== i))}
        />
      ))}
      {value.length > MAX_WORKSHEETS ? <FieldError testID="worksheets-too-many" message={`At most ${MAX_WORKSHEETS} worksheets.`} /> : null}
      {error ? (
        <Text testID="editor-error-worksheets" style={type.caption}>
          Not saved until this is fixed: {error}
        </Text>
      ) : null}
      <Button
        testID="add-worksheet"
        variant="quiet"
        label="Add a worksheet"
        disabled={value.length >= MAX_WORKSHEETS}
        onPress={() => onChange([...value, blankWorksheet()])}
      />
    </View>
  );
}

function WorksheetForm({ index: i, worksheet: ws, onChange, onRemove }: { index: number; worksheet: Worksheet; onChange: (ws: Worksheet) => void; onRemove: () => void }) {
  const problems = useMemo(() => problemsOf(ws), [ws]);
  const run = useMemo(() => runnable(ws, problems), [ws, problems]);
  const result = useMemo<WorksheetResult | undefined>(() => {
    if (!run) return undefined;
    try {
      return compileWorksheetWithKit(run).evaluate({});
    } catch {
      return undefined;
    }
  }, [run]);
  const id = `ws-${i}`;

  const field = (name: 'name' | 'title' | 'summary', label: string, extra: { lines?: number; mono?: boolean; hint?: string } = {}) => (
    <View testID={`${id}-${name}`}>
      <EditorField
        name={`${id}-${name}`}
        label={label}
        value={ws[name] ?? ''}
        error={problems.get(name)}
        onChangeText={(text) => {
          const next = { ...ws, [name]: text };
          if (name === 'summary' && text === '') delete next.summary;
          onChange(next);
        }}
        {...extra}
      />
    </View>
  );

  return (
    <View testID={id} style={styles.sheet}>
      <Text style={type.heading}>{ws.title.trim() || `Worksheet ${i + 1}`}</Text>
      {field('name', 'Name', { mono: true, hint: 'Lower-case words joined by hyphens, e.g. "cavity-thrust".' })}
      {field('title', 'Title')}
      {field('summary', 'Summary (optional)', { lines: 3 })}

      {groups.map((g) => (
        <RowsGroup
          key={g.group}
          id={id}
          spec={g}
          rows={ws[g.group] as unknown as Row[]}
          problems={problems}
          result={result}
          onChange={(rows) => onChange({ ...ws, [g.group]: rows })}
        />
      ))}

      <PlotsField id={id} plots={ws.plots} problems={problems} onChange={(plots) => onChange({ ...ws, plots })} />

      <View testID={`${id}-run`} style={styles.run}>
        <Text style={type.uiStrong}>Run</Text>
        {run ? (
          <WorksheetView key={run.inputs.map((x) => `${x.name}=${x.default}`).join('|')} worksheet={run} />
        ) : (
          <Notice tone="empty" testID={`${id}-not-run`} title="Not run yet">
            It needs a name, a title and at least one step without problems; fix the fields marked above.
          </Notice>
        )}
      </View>

      <Button testID={`${id}-remove`} variant="quiet" label="Remove this worksheet" onPress={onRemove} />
    </View>
  );
}

function RowsGroup({
  id,
  spec,
  rows,
  problems,
  result,
  onChange,
}: {
  id: string;
  spec: (typeof groups)[number];
  rows: Row[];
  problems: Map<string, string>;
  result?: WorksheetResult;
  onChange: (rows: Row[]) => void;
}) {
  const { group, key } = spec;
  const move = (from: number, to: number) => {
    const next = [...rows];
    [next[from], next[to]] = [next[to], next[from]];
    onChange(next);
  };
  const setField = (j: number, f: FieldSpec, text: string) => {
    const row = { ...rows[j], [f.field]: text };
    if (f.optional && text === '') delete row[f.field];
    onChange(rows.map((r, k) => (k === j ? row : r)));
  };
  const groupProblem = problems.get(group);

  return (
    <View testID={`${id}-${group}`} style={styles.group}>
      <Text style={type.uiStrong}>{spec.title}</Text>
      {rows.map((row, j) => {
        const rowId = `${id}-${key}-${j}`;
        const rowProblem = problems.get(`${group}.${j}`);
        return (
          <View key={j} testID={rowId} style={styles.row}>
            {spec.fields.map((f) => (
              <View key={f.field} testID={`${rowId}-${f.field}`}>
                <EditorField
                  name={`${rowId}-${f.field}`}
                  label={f.label}
                  value={row[f.field] ?? ''}
                  lines={f.lines}
                  mono={f.mono}
                  error={problems.get(`${group}.${j}.${f.field}`)}
                  onChangeText={(text) => setField(j, f, text)}
                />
              </View>
            ))}
            {rowProblem ? <FieldError testID={`${rowId}-error`} message={rowProblem} /> : null}
            {group !== 'inputs' ? <Readout testID={`${rowId}-value`} group={group} name={row.name} label={row.label} result={result} /> : null}
            <View style={styles.rowActions}>
              <Button testID={`${rowId}-up`} variant="quiet" label="Move up" disabled={j === 0} onPress={() => move(j, j - 1)} />
              <Button testID={`${rowId}-down`} variant="quiet" label="Move down" disabled={j === rows.length - 1} onPress={() => move(j, j + 1)} />
              <Button testID={`${rowId}-remove`} variant="quiet" label="Remove" onPress={() => onChange(rows.filter((_, k) => k !== j))} />
            </View>
          </View>
        );
      })}
      {groupProblem ? <FieldError testID={`${id}-${group}-error`} message={groupProblem} /> : null}
      <Button testID={`${id}-add-${key}`} variant="quiet" label={spec.addLabel} onPress={() => onChange([...rows, spec.blank()])} />
    </View>
  );
}

/** A step's value or a check's verdict at the defaults, or the error at that row, beside the row. */
function Readout({ testID, group, name, label, result }: { testID: string; group: 'steps' | 'checks'; name?: string; label?: string; result?: WorksheetResult }) {
  if (!result) return null;
  // The row's error names it by its label, as the run below does.
  const say = (message: string) => (name && label ? withLabels(message, { [name]: label }) : message);
  if (group === 'steps') {
    const r = result.steps.find((s) => s.name === name);
    if (!r) return <Text testID={testID} style={type.small}>Not run: fix the fields marked above.</Text>;
    if (r.error) return <FieldError testID={testID} message={say(r.error.message)} />;
    return (
      <Text testID={testID} style={type.mono}>
        = {r.value?.display}
      </Text>
    );
  }
  const r = result.checks.find((c) => c.name === name);
  if (!r) return <Text testID={testID} style={type.small}>Not run: fix the fields marked above.</Text>;
  if (r.error) return <FieldError testID={testID} message={say(r.error.message)} />;
  return (
    <Text testID={testID} style={type.caption}>
      {r.holds ? 'Holds' : 'Fails'} at the defaults: {r.message}
    </Text>
  );
}

/** The plots of a worksheet, as JSON: its text is kept while it does not parse, and emitted when it does. */
function PlotsField({ id, plots, problems, onChange }: { id: string; plots: Worksheet['plots']; problems: Map<string, string>; onChange: (plots: Worksheet['plots']) => void }) {
  const shown = (p: Worksheet['plots']) => (p.length === 0 ? '[]' : JSON.stringify(p, null, 2));
  const [text, setText] = useState(() => shown(plots));
  const [jsonError, setJsonError] = useState<string>();

  // When the plots change from outside (the other editor's version taken), show them.
  useEffect(() => {
    setText((current) => {
      try {
        if (JSON.stringify(JSON.parse(current)) === JSON.stringify(plots)) return current;
      } catch {
        // The text does not parse, and the value did not come from it: show the value.
      }
      setJsonError(undefined);
      return shown(plots);
    });
  }, [plots]);

  const schemaProblem = [...problems.entries()].find(([key]) => key === 'plots' || key.startsWith('plots.'));
  const error = jsonError ?? (schemaProblem ? `${schemaProblem[0].replace(/\.(\d+)/g, '[$1]')}: ${schemaProblem[1]}` : undefined);

  return (
    <View testID={`${id}-plots`}>
      <EditorField
        name={`${id}-plots`}
        label="Plots (JSON)"
        mono
        lines={6}
        value={text}
        error={error}
        hint='Plots are written as JSON for now: an array of { name, label, sweep: { input, from, to, points, scale }, series: [...], yScale }.'
        onChangeText={(next) => {
          setText(next);
          let parsed: unknown;
          try {
            parsed = JSON.parse(next.trim() === '' ? '[]' : next);
          } catch (e) {
            setJsonError(`Not JSON: ${(e as Error).message}`);
            return;
          }
          if (!Array.isArray(parsed)) {
            setJsonError('Not a JSON array of plots.');
            return;
          }
          setJsonError(undefined);
          onChange(parsed as Worksheet['plots']);
        }}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.md },
  sheet: { gap: space.md, paddingTop: space.md, borderTopColor: colors.rule, borderTopWidth: 1 },
  group: { gap: space.sm },
  row: { gap: space.xs, paddingLeft: space.sm, borderLeftColor: colors.rule, borderLeftWidth: 2 },
  rowActions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  run: { gap: space.xs, paddingLeft: space.sm, borderLeftColor: colors.teal, borderLeftWidth: 2 },
});
