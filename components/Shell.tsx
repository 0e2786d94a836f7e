import { usePathname } from 'expo-router';
import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { useHealth } from './queries/health';
import { Navigation } from './nav/Navigation';
import { Wordmark } from './nav/Wordmark';
import { colors, layout, space, type } from './theme';
import { ConfirmHost } from './ui/ConfirmDialog';
import { Notice } from './ui/Notice';
import { useViewer } from './viewer';

/** The frame around every screen: navigation for the viewer's role, the page, the footer. */
export function Shell({ children }: { children: ReactNode }) {
  const { width } = useWindowDimensions();
  const { role } = useViewer();
  const insets = useSafeAreaInsets();
  const pathname = usePathname();
  const wide = width >= layout.wideMinWidth;
  // Entry pages, the Desk and the Library (its filters) put a second column beside the text on a wide screen.
  const twoColumn = wide && (/^\/(entries|desk)(\/|$)/.test(pathname ?? '') || pathname === '/');

  const page = (
    <ScrollView style={styles.scroll} contentContainerStyle={[styles.scrollContent, wide && styles.scrollContentWide]}>
      <View role="main" style={[styles.main, twoColumn && styles.mainTwoColumn]}>
        <DatabaseNotice />
        {children}
      </View>
      <Footer />
    </ScrollView>
  );

  if (wide) {
    return (
      <View style={[styles.root, styles.row, { paddingTop: insets.top }]}>
        <Navigation variant="rail" role={role} />
        {page}
        <ConfirmHost />
      </View>
    );
  }
  return (
    <View style={[styles.root, { paddingTop: insets.top }]}>
      <View role="banner" style={styles.masthead}>
        <Wordmark size="small" />
      </View>
      {page}
      <View style={[styles.barDock, { paddingBottom: insets.bottom }]}>
        <Navigation variant="bar" role={role} />
      </View>
      <ConfirmHost />
    </View>
  );
}

/** Shown only while the server answers but its database does not. */
function DatabaseNotice() {
  const { data } = useHealth();
  if (data?.db !== 'down') return null;
  return (
    <Notice tone="error" role="alert" testID="db-down" title="The database is not answering.">
      Pages that read from the library will fail until it is back. Check that MariaDB is running.
    </Notice>
  );
}

function Footer() {
  const { data } = useHealth();
  return (
    <View role="contentinfo" testID="footer" style={styles.footer}>
      <Text style={type.small}>
        Entries are not legal, financial or investment advice. They judge mechanisms and claims, never people.
      </Text>
      {data ? <Text style={styles.version}>Counterweight {data.version}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, backgroundColor: colors.paper },
  row: { flexDirection: 'row' },
  masthead: {
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
    borderBottomColor: colors.rule,
    borderBottomWidth: 1,
  },
  // Above the page, so that the "More" list that opens upwards from the bar covers it.
  barDock: { backgroundColor: colors.paperDeep, zIndex: 1 },
  scroll: { flex: 1 },
  scrollContent: { flexGrow: 1, padding: space.md, paddingTop: space.lg },
  scrollContentWide: { paddingHorizontal: space.xxl, paddingTop: space.xxl },
  main: { flexGrow: 1, width: '100%', maxWidth: layout.contentMaxWidth, gap: space.md },
  mainTwoColumn: { maxWidth: layout.twoColumnMaxWidth },
  footer: {
    width: '100%',
    maxWidth: layout.contentMaxWidth,
    gap: space.xxs,
    marginTop: space.xxl,
    paddingTop: space.md,
    borderTopColor: colors.rule,
    borderTopWidth: 1,
  },
  version: { ...type.mono, fontSize: 12, lineHeight: 17, color: colors.inkMuted },
});
