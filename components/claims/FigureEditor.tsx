/**
 * The figures found in the text, each editable before a re-run: the quantity retyped, the kind or
 * the role changed, the figure removed; and figures added by hand. Each figure is read live with
 * the same parseQuantity the server uses; the server's own objection to a figure shows beside it.
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
import type { Figure } from './api';
import { EXAMPLE_FOR, FIGURE_KINDS, readDraft, ROLE_LABEL, ROLES_FOR, withKind, type FigureDraft } from './figures';

interface FigureEditorProps {
  drafts: FigureDraft[];
  onChange: (drafts: FigureDraft[]) => void;
  /** The figures of the result on screen, to show the server's reading of those not changed. */
  figures: Figure[];
  /** The server's objections, by figure id. */
  errors: Record<string, string>;
}

const KIND_CHIP = FIGURE_KIND_SHORT;

export function FigureEditor({ drafts, onChange, figures, errors }: FigureEditorProps) {
  const [added, setAdded] = useState(0);
  const update = (id: string, next: FigureDraft) => onChange(drafts.map((d) => (d.id === id ? next : d)));
  const remove = (id: string) => onChange(drafts.filter((d) => d.id !== id));
  const add = () => {
    const n = added + 1;
    setAdded(n);
    onChange([...drafts, { id: `new-${n}`, kind: 'thrust', quantity: '', role: null }]);
  };

  return (
    <View style={styles.root}>
      {drafts.length === 0 ? <Text style={type.body}>No figures. Add one by hand to run the checks it allows.</Text> : null}
      <View role="list" aria-label="Figures found" style={styles.list}>
        {drafts.map((draft) => (
          <FigureRow
            key={draft.id}
            draft={draft}
            original={figures.find((f) => f.id === draft.id)}
            error={errors[draft.id]}
            onChange={(next) => update(draft.id, next)}
            onRemove={() => remove(draft.id)}
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
  error: string | undefined;
  onChange: (draft: FigureDraft) => void;
  onRemove: () => void;
}

function FigureRow({ draft, original, error, onChange, onRemove }: FigureRowProps) {
  const [focused, setFocused] = useState(false);
  const id = useId();
  const { id: figureId, kind } = draft;
  const testID = `claim-figure-${figureId}`;
  const unchanged = original && original.kind === kind && original.quantity === draft.quantity.trim();
  const reading = draft.quantity.trim() === '' ? null : readDraft(draft);
  const problem = error ?? (reading && !reading.ok ? reading.message : undefined);
  const display = unchanged ? original.display : reading?.ok ? reading.display : undefined;
  const si = unchanged ? original.si : reading?.ok ? reading.si : undefined;
  const name = figureId.startsWith('new-') ? `Added figure ${figureId.slice(4)}` : `Figure ${figureId}`;
  const roles = ROLES_FOR[kind];

  return (
    <View role="listitem" testID={testID} style={styles.row}>
      <View style={styles.head}>
        <Text style={type.uiStrong}>
          {name} · {FIGURE_KIND_LABEL[kind]}
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
      <Text nativeID={`${id}-label`} style={type.ui}>
        Quantity
      </Text>
      <TextInput
        testID={`${testID}-quantity`}
        aria-label={`${name}: the quantity with its unit`}
        aria-invalid={problem ? true : undefined}
        aria-describedby={problem ? `${id}-error` : `${id}-reading`}
        value={draft.quantity}
        onChangeText={(quantity) => onChange({ ...draft, quantity })}
        placeholder={EXAMPLE_FOR[kind]}
        placeholderTextColor={colors.inkMuted}
        autoCapitalize="none"
        autoCorrect={false}
        spellCheck={false}
        onFocus={() => setFocused(true)}
        onBlur={() => setFocused(false)}
        style={[styles.input, problem ? inputBox.error : null, focused && inputBox.focused]}
      />
      {display !== undefined && si !== undefined ? (
        <Text nativeID={`${id}-reading`} style={type.small}>
          In SI:{' '}
          <Text testID={`${testID}-si`} {...dataAttributes({ si: String(si) })} style={styles.mono}>
            {display}
          </Text>
        </Text>
      ) : null}
      {problem ? <FieldError id={`${id}-error`} testID={`${testID}-error`} message={problem} /> : null}
      <Text style={type.ui}>Kind</Text>
      <ChoiceChips
        label={`${name}: kind`}
        testID={`${testID}-kind`}
        options={FIGURE_KINDS.map((value) => ({ value, label: KIND_CHIP[value] }))}
        value={kind}
        onChange={(next) => onChange(withKind(draft, next))}
      />
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
  mono: { ...type.mono, fontSize: 13, color: colors.ink },
  input: { ...type.mono, ...inputBox.box, fontSize: 16, lineHeight: 22 },
});
