import { router, usePathname } from 'expo-router';
import { useEffect, useState } from 'react';
import { Platform, StyleSheet, Text, View, type TextStyle } from 'react-native';
import { colors, radius, space, type } from '../theme';
import { Button } from '../ui/Button';

/**
 * Permalinks carry a screen's typed inputs in the query, one parameter per input, exactly as typed:
 * `/checks/photon-bound?F=0.2%20lbf&P=1.5%20kW`. An input left empty is left out (its default applies).
 */

/** The query of a route's params, one string per name (the first where a name is repeated). */
export function readQuery(params: Record<string, string | string[] | undefined>): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, value] of Object.entries(params)) {
    const first = Array.isArray(value) ? value[0] : value;
    if (first !== undefined) out[key] = first;
  }
  return out;
}

function permalinkQuery(values: Record<string, string>): string {
  return Object.entries(values)
    .filter(([, text]) => text.trim() !== '')
    .map(([name, text]) => `${encodeURIComponent(name)}=${encodeURIComponent(text)}`)
    .join('&');
}

/**
 * Keeps the address in step with the inputs, once the reader has changed one (`values` defined).
 * Setting the params of the current route replaces the history entry rather than adding one.
 */
export function useAddressSync(values: Record<string, string> | undefined) {
  useEffect(() => {
    if (!values) return;
    router.setParams(Object.fromEntries(Object.entries(values).map(([k, v]) => [k, v.trim() === '' ? undefined : v])));
  }, [values]);
}

/** On the web, the full address to share; elsewhere the app's own path. */
function shareableUrl(pathname: string, query: string): string {
  const path = query ? `${pathname}?${query}` : pathname;
  return Platform.OS === 'web' ? `${window.location.origin}${path}` : path;
}

type CopyState = 'idle' | 'copied' | 'failed';

/** The link to this screen with these inputs, shown in full, and a button that copies it. */
export function Permalink({ values }: { values: Record<string, string> }) {
  const pathname = usePathname();
  const url = shareableUrl(pathname, permalinkQuery(values));
  const [copy, setCopy] = useState<{ url: string; state: CopyState }>({ url, state: 'idle' });
  const state = copy.url === url ? copy.state : 'idle';

  const onCopy = async () => {
    const clipboard = Platform.OS === 'web' ? navigator.clipboard : undefined;
    try {
      if (!clipboard) throw new Error('no clipboard');
      await clipboard.writeText(url);
      setCopy({ url, state: 'copied' });
    } catch {
      setCopy({ url, state: 'failed' });
    }
  };

  return (
    <View style={styles.box}>
      <Text style={type.uiStrong}>Link to these figures</Text>
      <Text style={type.caption}>Anyone who opens it sees these inputs and the same result.</Text>
      <Text testID="permalink-url" selectable style={styles.url}>
        {url}
      </Text>
      <View style={styles.actions}>
        <Button label="Copy link" testID="permalink" onPress={() => void onCopy()} />
        <Text testID="permalink-status" aria-live="polite" style={type.caption}>
          {state === 'copied' ? 'Copied.' : state === 'failed' ? 'Copying is not allowed here: select the link above and copy it.' : ''}
        </Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    gap: space.xs,
    borderColor: colors.rule,
    borderWidth: 1,
    borderRadius: radius.md,
    padding: space.md,
  },
  // On the web a long link may break anywhere rather than run off a phone's screen.
  url: { ...type.mono, fontSize: 13, lineHeight: 19, color: colors.teal, ...({ wordBreak: 'break-all' } as TextStyle) },
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
});
