import { useState } from 'react';
import { Platform, StyleSheet, Text, View } from 'react-native';
import { space, type } from '../theme';
import { Button } from '../ui/Button';

type CopyState = 'idle' | 'copied' | 'failed';

interface CopyButtonProps {
  text: string;
  label: string;
  /** On the button; the status beside it is `<testID>-status`. */
  testID: string;
  /** What to select by hand when the browser refuses ("the paragraph above"). */
  fallback: string;
}

/** A button that puts `text` on the clipboard, and a status that says whether it did (as the Cite panel does). */
export function CopyButton({ text, label, testID, fallback }: CopyButtonProps) {
  const [copy, setCopy] = useState<{ text: string; state: CopyState }>({ text, state: 'idle' });
  // A new text (a re-run, another style) starts from idle again.
  const state = copy.text === text ? copy.state : 'idle';

  const onCopy = async () => {
    try {
      const clipboard = Platform.OS === 'web' ? navigator.clipboard : undefined;
      if (!clipboard) throw new Error('no clipboard');
      await clipboard.writeText(text);
      setCopy({ text, state: 'copied' });
    } catch {
      setCopy({ text, state: 'failed' });
    }
  };

  return (
    <View style={styles.row}>
      <Button testID={testID} label={label} variant="quiet" onPress={() => void onCopy()} />
      <Text testID={`${testID}-status`} role="status" style={type.caption}>
        {state === 'copied' ? 'Copied.' : state === 'failed' ? `This browser refused the copy; select ${fallback} and copy it by hand.` : ''}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
});
