import { StyleSheet, Text, View } from 'react-native';
import type { Citation } from '@/shared/entries/schema';
import { isWebAddress } from '@/shared/entries/web-address';
import { colors, space, type } from '../theme';
import { TextLink } from '../ui/TextLink';
import { citationLine } from './sections';

/** Where a source can be found: its DOI as an address, or its own URL. */
function addressOf(csl: Citation['csl']): string | undefined {
  if (typeof csl.DOI === 'string' && csl.DOI) return `https://doi.org/${encodeURI(csl.DOI)}`;
  // The server accepts only http(s) addresses; anything else that reaches here is not made a link.
  return typeof csl.URL === 'string' && isWebAddress(csl.URL) ? csl.URL : undefined;
}

/** The sources of a version, numbered in the editors' order, each with what it supports. */
export function SourceList({ sources }: { sources: Citation[] }) {
  if (sources.length === 0) {
    return <Text style={type.caption}>No sources are listed in this version.</Text>;
  }
  return (
    <View role="list" style={styles.list}>
      {sources.map((source, i) => {
        const address = addressOf(source.csl);
        return (
          <View role="listitem" key={`${source.csl.id}-${i}`} testID={`source-${i + 1}`} style={styles.item}>
            <Text style={type.body}>
              <Text style={styles.number}>{i + 1}. </Text>
              {citationLine({ ...source, note: '' })}
              {typeof source.csl['container-title'] === 'string' ? `. ${source.csl['container-title']}` : ''}
            </Text>
            {address ? <TextLink href={address}>{address}</TextLink> : null}
            {source.note ? <Text style={type.caption}>{source.note}</Text> : null}
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  item: { gap: 2 },
  number: { ...type.mono, color: colors.inkMuted },
});
