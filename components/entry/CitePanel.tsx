import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { ChoiceChips } from '../admin/ChoiceChips';
import { CITE_DATA_FORMATS, CITE_FILE_EXTENSION, CITE_FORMAT_LABEL, CITE_FORMATS, type CiteFormat } from '@/shared/api-types';
import { queryString } from '../http/client';
import { entryPath, useCite } from '../queries/entries';
import { colors, focusRing, radius, space, type } from '../theme';
import { Button } from '../ui/Button';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { formatDay } from './format';

const formatLabels = CITE_FORMAT_LABEL;

/** Formats that are data for a reference manager, shown in the mono face; the rest read as prose. */
const asData = new Set<CiteFormat>(CITE_DATA_FORMATS);

type CopyState = 'idle' | 'copied' | 'failed';

/** "A", "A and B", "A, B and C": names as a sentence lists them. */
export function nameList(names: readonly string[]): string {
  if (names.length < 2) return names[0] ?? '';
  return `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
}

/**
 * How to cite this version of the entry: a text style or a format for reference managers, with
 * who wrote it (every editor of a published version up to this one) and who reviewed it, its
 * permanent address, version and date, a button that copies it, and the data formats as files.
 */
export function CitePanel({ slug, version }: { slug: string; version: number }) {
  const [format, setFormat] = useState<CiteFormat>('apa');
  const [copy, setCopy] = useState<CopyState>('idle');
  const { data, error, isPending, refetch } = useCite(slug, format, version);

  const choose = (next: CiteFormat) => {
    setFormat(next);
    setCopy('idle');
  };
  const copyText = async (text: string) => {
    try {
      await navigator.clipboard.writeText(text);
      setCopy('copied');
    } catch {
      setCopy('failed');
    }
  };

  return (
    <View testID="cite-panel" style={styles.root}>
      <ChoiceChips
        label="Citation format"
        testID="cite-format"
        options={CITE_FORMATS.map((value) => ({ value, label: formatLabels[value] }))}
        value={format}
        onChange={choose}
      />
      {isPending ? <Loading testID="cite-loading" label={`Formatting the citation in ${formatLabels[format]}…`} /> : null}
      {error ? <ErrorNotice testID="cite-error" error={error} what="the citation" onRetry={() => void refetch()} /> : null}
      {data ? (
        <>
          <Text testID="cite-text" selectable style={[asData.has(format) ? type.mono : type.body, styles.text]}>
            {data.text}
          </Text>
          <View style={styles.actions}>
            <Button testID="cite-copy" label={`Copy ${formatLabels[format]}`} onPress={() => void copyText(data.text)} />
            <Text testID="cite-copy-status" role="status" style={type.caption}>
              {copy === 'copied' ? 'Copied.' : copy === 'failed' ? 'This browser refused the copy; select the text and copy it by hand.' : ''}
            </Text>
          </View>
          {data.authors?.length ? (
            <Text testID="cite-credits" style={type.caption}>
              Written by {nameList(data.authors)}
              {data.reviewer ? `; reviewed by ${data.reviewer}` : ''}.
            </Text>
          ) : null}
          <Text testID="cite-permalink" style={type.caption}>
            Permanent address of version {data.version}: <Text style={styles.url}>{data.url}</Text> · published{' '}
            {formatDay(data.date)}
          </Text>
        </>
      ) : null}
      <View style={styles.downloads} role="group" aria-label="Download this version's citation as a file">
        <Text style={type.caption}>As a file for a reference manager:</Text>
        <View style={styles.actions}>
          {CITE_DATA_FORMATS.map((f) => (
            <Text
              key={f}
              testID={`cite-download-${f}`}
              role="link"
              {...{ href: `${entryPath(slug)}/cite${queryString({ format: f, version, download: 1 })}`, hrefAttrs: { download: `${slug}-v${version}.${CITE_FILE_EXTENSION[f]}` } }}
              style={styles.download}
            >
              {formatLabels[f]} (.{CITE_FILE_EXTENSION[f]})
            </Text>
          ))}
        </View>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.sm },
  text: {
    backgroundColor: colors.surface,
    borderColor: colors.rule,
    borderWidth: 1,
    borderRadius: radius.sm,
    padding: space.sm,
  },
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  url: { ...type.mono, fontSize: 12, color: colors.ink },
  downloads: { gap: space.xxs },
  // A link that looks like the quiet button beside it, at least 44 px high (WCAG 2.5.5 target size).
  download: {
    ...type.uiStrong,
    ...focusRing,
    color: colors.teal,
    textDecorationLine: 'underline',
    minHeight: 44,
    paddingHorizontal: space.sm,
    paddingVertical: space.sm - 1,
    borderColor: colors.teal,
    borderWidth: 1,
    borderRadius: radius.sm,
    backgroundColor: colors.surface,
  },
});
