import { entryVersionPath } from '@/shared/permalink';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { EntryContent } from '@/shared/entries/schema';
import { useTaxonomy } from '../queries/taxonomy';
import type { EntryVersionDto } from '@/shared/api-types';
import { colors, focusRing, radius, space, type } from '../theme';
import { dataAttributes } from '../worksheet/dataAttributes';
import { TextLink } from '../ui/TextLink';
import { formatDay } from './format';

interface EntryMetaProps {
  slug: string;
  version: EntryVersionDto;
  /** True on `/entries/<slug>/v/<n>`: the page of one version, not the latest. */
  pinned: boolean;
  /** The "Cite this version" action beside the permalink: takes the reader to the citation panel. */
  onCite?: () => void;
}

/** What the entry is about (laws broken, mechanism class, other names) and which version this is, by whom. */
export function EntryMeta({ slug, version, pinned, onCite }: EntryMetaProps) {
  const { content } = version;
  const permalink = entryVersionPath(slug, version.number);
  return (
    <View style={styles.root}>
      <Classification content={content} />
      {content.aliases.length > 0 ? (
        <Text testID="entry-aliases" style={type.caption}>
          Also pitched as {content.aliases.join(', ')}
        </Text>
      ) : null}
      <Text testID="entry-version" style={type.caption}>
        Version {version.number}, published {formatDay(version.publishedAt)} · written by {version.author.displayName}
        {version.reviewer ? `, vetted by ${version.reviewer.displayName}` : ''}
      </Text>
      <View style={styles.links}>
        <View>
          {pinned ? (
            <TextLink href={`/entries/${slug}`} testID="entry-latest">
              Read the latest version
            </TextLink>
          ) : (
            <TextLink href={permalink} testID="entry-permalink">
              {`Permalink to version ${version.number}`}
            </TextLink>
          )}
        </View>
        {onCite ? (
          <Pressable role="button" testID="entry-cite-action" onPress={onCite} style={styles.cite} {...dataAttributes({ print: 'hide' })}>
            <Text style={styles.citeLabel}>Cite this version</Text>
          </Pressable>
        ) : null}
      </View>
    </View>
  );
}

/** The conservation laws the claim breaks and its mechanism class, by name. */
function Classification({ content }: { content: EntryContent }) {
  const { data } = useTaxonomy();
  const lawName = (slug: string) => data?.laws.find((l) => l.slug === slug)?.name ?? slug;
  const className = data?.classes.find((c) => c.slug === content.mechanismClass)?.name ?? content.mechanismClass;
  return (
    <View style={styles.tags}>
      {content.laws.map((law) => (
        <Text key={law} testID={`entry-law-${law}`} style={[styles.tag, styles.law]}>
          {lawName(law)}
        </Text>
      ))}
      <Text testID="entry-class" style={styles.tag}>
        {className}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.xs },
  tags: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  tag: {
    ...type.small,
    color: colors.ink,
    borderColor: colors.ruleStrong,
    borderWidth: 1,
    borderRadius: radius.pill,
    paddingHorizontal: space.xs,
    paddingVertical: 2,
  },
  law: { borderColor: colors.teal, backgroundColor: colors.tealWash, color: colors.teal },
  links: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md },
  cite: {
    ...focusRing,
    minHeight: 44,
    justifyContent: 'center',
    paddingHorizontal: space.md,
    borderColor: colors.teal,
    borderWidth: 1,
    borderRadius: radius.sm,
    backgroundColor: colors.surface,
  },
  citeLabel: { ...type.uiStrong, color: colors.teal },
});
