import { StyleSheet, Text, View } from 'react-native';
import type { EntryContent } from '@/shared/entries/schema';
import { formatWhen } from '../admin/format';
import { DiffView } from '../entry/DiffView';
import { space, type } from '../theme';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import type { SaveState } from './useAutosave';

interface SaveStatusProps {
  state: SaveState;
  /** What this editor has typed, to compare with the other version after a conflict. */
  mine?: EntryContent;
  onRetry: () => void;
  onKeepMine: () => void;
  onTakeTheirs: () => void;
}

const words: Record<Exclude<SaveState['kind'], 'saved' | 'failed' | 'conflict'>, string> = {
  unsaved: 'Changes not saved yet…',
  incomplete: 'Not saved: the draft saves itself once every required part is filled in (see the notes beside the fields).',
  saving: 'Saving…',
};

/** Whether the draft is saved, and what to do when it could not be, or when someone saved it elsewhere. */
export function SaveStatus({ state, mine, onRetry, onKeepMine, onTakeTheirs }: SaveStatusProps) {
  if (state.kind === 'conflict') {
    return (
      <>
        <Text testID="save-status" role="status" style={type.caption}>
          Saving paused: this draft changed elsewhere.
        </Text>
        <Notice
        role="alert"
        testID="edit-conflict"
        title="This draft was saved somewhere else since you opened it."
        action={
          <View style={styles.conflict}>
            {mine ? (
              <DiffView from={{ label: 'the copy saved elsewhere', content: state.theirs.content }} to={{ label: 'yours', content: mine }} />
            ) : null}
            <View style={styles.actions}>
              <Button testID="conflict-keep-mine" label="Keep mine and save over it" onPress={onKeepMine} />
              <Button testID="conflict-take-theirs" variant="quiet" label="Drop mine and take that copy" onPress={onTakeTheirs} />
            </View>
          </View>
        }
      >
        {`Saved ${formatWhen(state.theirs.updatedAt)} by ${state.theirs.author.displayName}, perhaps in another window. Nothing has been overwritten: choose which text to keep. Saving is paused until you do.`}
        </Notice>
      </>
    );
  }
  if (state.kind === 'failed') {
    return (
      <Notice role="alert" testID="save-status" title="Not saved." action={<Button testID="save-retry" label="Try again" onPress={onRetry} />}>
        {state.problem.message}
      </Notice>
    );
  }
  return (
    <Text testID="save-status" role="status" style={type.caption}>
      {state.kind === 'saved' ? `Saved ${formatWhen(state.at.toISOString())}.` : words[state.kind]}
    </Text>
  );
}

const styles = StyleSheet.create({
  conflict: { gap: space.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
});
