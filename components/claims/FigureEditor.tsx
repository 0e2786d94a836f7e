/**
 * The figures found in the text, each editable: the value retyped, the upper end of a range, the
 * kind or the role changed, the figure removed; and figures added by hand. Each figure is read live
 * with the same reader the server uses and marked at once when it cannot be read; the screen re-runs
 * the checks by itself once the figures are readable and the reader has stopped typing. The
 * server's own objection to a figure shows beside that figure.
 */
import { useId, useState } from 'react';
import { StyleSheet, Text, TextInput, View } from 'react-native';
import { FIGURE_KIND_LABEL, FIGURE_KIND_SHORT, type FigureRole } from '@/shared/claims/types';
import { ChoiceChips } from '../admin/ChoiceChips';
import { colors, space, type } from '../theme';
import { Button } from '../ui/Button';
import { inputBox } from '../ui/inputBox';
import { dataAttributes } from '../worksheet/dataAttributes';
import { FieldError } from '../worksheet/QuantityField';
import type { Figure } from '@/shared/api-types';
import { EXAMPLE_FOR, FIGURE_KINDS, rangeDisplay, readDraftFully, ROLE_LABEL, ROLES_FOR, withKind, type FigureDraft } from './figures';
import { FigureReadingNotes } from './ResultParts';

/** The server's objections to one figure, by field. */
export interface FigureServerErrors {
  quantity?: string;
  upper?: string;
}

interface FigureEditorProps {
  drafts: FigureDraft[];
  onChange: (drafts: FigureDraft[]) => void;
  /** The figures of the result on screen, to show the server's reading of those not changed. */
  figures: Figure[];
  /** The server's objections, by draft key. */
  errors: Record<string, FigureServerErrors>;
}

export function FigureEditor({ drafts, onChange, figures, errors }: FigureEditorProps) {
  const [added, setAdded] = useState(0);
  const update = (key: string, next: FigureDraft) => onChange(drafts.map((d) => (d.key === key ? next : d)));
  const remove = (key: string) => onChange(drafts.filter((d) => d.key !== key));
  const add = () => {
    const n = added + 1;
    setAdded(n);
    onChange([...drafts, { key: `new-${n}`, id: `new-${n}`, kind: 'thrust', quantity: '', upper: '', role: null }]);
  };

  return (
    <View style={styles.root}>
      {drafts.length === 0 ? <Text style={type.body}>No figures. Add one by hand to run the checks it allows.</Text> : null}
      <View role="list" aria-label="Figures found" style={styles.list}>
        {drafts.map((draft) => (
          <FigureRow
            key={draft.key}
            draft={draft}
            original={figures.find((f) => f.id === draft.id)}
            error={errors[draft.key]}
            onChange={(next) => update(draft.key, next)}
            onRemove={() => remove(draft.key)}
          />
        ))}
      </View>
      <Button testID="claim-figure-add" variant="quiet" label="Add a figure" onPress={add} />
    </View>
  );
}

interface FigureRowProps {
  draft: FigureDraft;
  original: Figure | undefined;
  error: FigureServerErrors | undefined;
  onChange: (draft: FigureDraft) => void;
  onRemove: () => void;
}

function FigureRow({ draft, original, error, onChange, onRemove }: FigureRowProps) {
  const [focused, setFocused] = useState<'quantity' | 'upper' | null>(null);
  const [kindOpen, setKindOpen] = useState(draft.id.startsWith('new-'));
  const id = useId();
  const { id: figureId, kind } = draft;
  const testID = `claim-figure-${figureId}`;
  const unchanged =
    original !== undefined &&
    original.kind === kind &&
    original.quantity === draft.quantity.trim() &&
    (original.upper?.quantity ?? '') === draft.upper.trim();
  const typedYet = draft.quantity.trim() !== '' || draft.upper.trim() !== '';
  const reading = readDraftFully(draft);
  // An added figure not typed yet is not an error: it only waits for its value.
  const quantityProblem = error?.quantity ?? (typedYet || !figureId.startsWith('new-') ? reading.problems.quantity : undefined);
  const upperProblem = error?.upper ?? reading.problems.upper;
  const lower = unchanged ? { si: original.si, display: original.display } : reading.lower;
  const upper = unchanged ? original.upper : reading.upper;
  const name = figureId.startsWith('new-') ? `Added figure ${figureId.slice(4)}` : `Figure ${figureId}`;
  const roles = ROLES_FOR[kind];
  const field = (which: 'quantity' | 'upper', problem: string | undefined) => [
    styles.input,
    problem ? inputBox.error : null,
    focused === which && inputBox.focused,
  ];

  return (
    <View role="listitem" testID={testID} style={styles.row}>
      <View style={styles.head}>
        <Text style={type.uiStrong}>
          {name} · {FIGURE_KIND_LABEL[kind]}
          {draft.upper.trim() ? ' · a range' : ''}
        </Text>
        <Button testID={`${testID}-remove`} variant="quiet" label="Remove" onPress={onRemove} />
      </View>
      <Text style={type.caption}>
        {draft.text !== undefined && draft.start != null ? (
          <>
            As written: <Text style={styles.mono}>{draft.text}</Text>
          </>
        ) : (
          'Typed by hand'
        )}
      </Text>
      {original && unchanged ? <FigureReadingNotes figure={original} testID={testID} /> : null}
      {original && !unchanged ? (
        <Text testID={`${testID}-changed`} style={type.caption}>
          Changed by you; the checks run on your figure.
        </Text>
      ) : null}

      <View style={styles.fields}>
        <View style={styles.field}>
          <Text nativeID={`${id}-q`} style={type.ui}>
            {draft.upper.trim() ? 'Lower end' : 'Value'}
          </Text>
          <TextInput
            testID={`${testID}-quantity`}
            aria-label={`${name}: the value with its unit${draft.upper.trim() ? ' (the lower end of the range)' : ''}`}
            aria-invalid={quantityProblem ? true : undefined}
            aria-describedby={quantityProblem ? `${id}-q-error` : `${id}-reading`}
            value={draft.quantity}
            onChangeText={(quantity) => onChange({ ...draft, quantity })}
            placeholder={EXAMPLE_FOR[kind]}
            placeholderTextColor={colors.inkMuted}
            autoCapitalize="none"
            autoCorrect={false}
            spellCheck={false}
            onFocus={() => setFocused('quantity')}
            onBlur={() => setFocused(null)}
            style={field('quantity', quantityProblem)}
          />
          {quantityProblem ? <FieldError id={`${id}-q-error`} testID={`${testID}-error`} message={quantityProblem} /> : null}
        </View>
        <View style={styles.field}>
          <Text style={type.ui}>Upper end, if a range</Text>
          <TextInput
            testID={`${testID}-upper`}
            aria-label={`${name}: the upper end of a range, with its unit; leave empty for a single value`}
            aria-invalid={upperProblem ? true : undefined}
            aria-describedby={upperProblem ? `${id}-u-error` : `${id}-reading`}
            value={draft.upper}
            onChangeText={(next) => onChange({ ...draft, upper: next })}
            placeholder="none"
            placeholderTextColor={colors.inkMuted}
            autoCapitalize="none"
            autoCorrect={false}
            spellCheck={false}
            onFocus={() => setFocused('upper')}
            onBlur={() => setFocused(null)}
            style={field('upper', upperProblem)}
          />
          {upperProblem ? <FieldError id={`${id}-u-error`} testID={`${testID}-upper-error`} message={upperProblem} /> : null}
        </View>
      </View>
      {lower ? (
        <Text nativeID={`${id}-reading`} style={type.small}>
          In SI:{' '}
          <Text
            testID={`${testID}-si`}
            {...dataAttributes(upper ? { si: String(lower.si), upperSi: String(upper.si) } : { si: String(lower.si) })}
            style={styles.mono}
          >
            {rangeDisplay(lower.display, upper?.display)}
          </Text>
        </Text>
      ) : null}

      <View style={styles.kindLine}>
        <Text style={type.ui}>
          Kind: <Text style={type.uiStrong}>{FIGURE_KIND_LABEL[kind]}</Text>
        </Text>
        <Button
          testID={`${testID}-kind-toggle`}
          variant="quiet"
          label={kindOpen ? 'Done' : 'Change the kind'}
          onPress={() => setKindOpen((o) => !o)}
        />
      </View>
      {kindOpen ? (
        <ChoiceChips
          label={`${name}: kind`}
          testID={`${testID}-kind`}
          options={FIGURE_KINDS.map((value) => ({ value, label: FIGURE_KIND_SHORT[value] }))}
          value={kind}
          onChange={(next) => onChange(withKind(draft, next))}
        />
      ) : null}
      {roles.length > 0 ? (
        <>
          <Text style={type.ui}>Role</Text>
          <ChoiceChips
            label={`${name}: role`}
            testID={`${testID}-role`}
            options={[{ value: 'none', label: 'Not stated' }, ...roles.map((value) => ({ value, label: ROLE_LABEL[value] }))]}
            value={draft.role ?? 'none'}
            onChange={(next) => onChange({ ...draft, role: next === 'none' ? null : (next as FigureRole) })}
          />
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.sm },
  list: { borderTopColor: colors.rule, borderTopWidth: 1 },
  row: { gap: space.xs, paddingVertical: space.md, borderBottomColor: colors.rule, borderBottomWidth: 1 },
  head: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'center', gap: space.xs },
  fields: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  field: { flexGrow: 1, flexBasis: 160, gap: space.xxs },
  kindLine: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  mono: { ...type.mono, fontSize: 13, color: colors.ink },
  input: { ...type.mono, ...inputBox.box, fontSize: 16, lineHeight: 22 },
});
