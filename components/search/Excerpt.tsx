import { useMemo } from 'react';
import { StyleSheet, Text } from 'react-native';
import { colors, fonts, type } from '../theme';
import { parseExcerpt } from './excerpt';

/** A search excerpt with the matched words set on the brass highlight, as Text spans (never injected HTML). */
export function Excerpt({ excerpt, testID }: { excerpt: string; testID?: string }) {
  const segments = useMemo(() => parseExcerpt(excerpt), [excerpt]);
  return (
    <Text testID={testID} style={type.body}>
      {segments.map((segment, i) =>
        segment.marked ? (
          <Text key={i} testID="mark" style={styles.mark}>
            {segment.text}
          </Text>
        ) : (
          segment.text
        ),
      )}
    </Text>
  );
}

const styles = StyleSheet.create({
  mark: {
    fontFamily: fonts.serifSemiBold,
    color: colors.ink,
    backgroundColor: colors.brassWash,
    textDecorationLine: 'underline',
    textDecorationColor: colors.brass,
  },
});
