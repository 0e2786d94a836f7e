import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { ChoiceChips } from '../admin/ChoiceChips';
import { CITE_DATA_FORMATS, CITE_FORMAT_LABEL, CITE_FORMATS, type CiteFormat } from '@/shared/api-types';
import { useCite } from '../queries/entries';
import { colors, radius, space, type } from '../theme';
import { Button } from '../ui/Button';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { formatDay } from './format';

const formatLabels = CITE_FORMAT_LABEL;

/** Formats that are data for a reference manager, shown in the mono face; the rest read as prose. */
const asData = new Set<CiteFormat>(CITE_DATA_FORMATS);

type CopyState = 'idle' | 'copied' | 'failed';

/**
 * How to cite this version of the entry: a text style or a format for reference managers, with
 * its permanent address, version and date, and a button that copies it.
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
          <Text testID="cite-permalink" style={type.caption}>
            Permanent address of version {data.version}: <Text style={styles.url}>{data.url}</Text> · published{' '}
            {formatDay(data.date)}
          </Text>
        </>
      ) : null}
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
});
