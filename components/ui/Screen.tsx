import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { space, type } from '../theme';

interface ScreenProps {
  /** `screen-<name>`, on the screen's root. */
  testID: string;
  title: string;
  /** A sentence or two in the reading face beneath the title. */
  lead?: ReactNode;
  children?: ReactNode;
}

/** The frame of every screen: its one top-level heading, an optional lead, then the content. */
export function Screen({ testID, title, lead, children }: ScreenProps) {
  return (
    <View testID={testID} style={styles.root}>
      <Text role="heading" aria-level={1} style={type.display}>
        {title}
      </Text>
      {lead ? <Text style={[type.reading, styles.lead]}>{lead}</Text> : null}
      {children}
    </View>
  );
}

/** A titled part of a screen. */
export function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <View style={styles.section}>
      <Text role="heading" aria-level={2} style={[type.title, styles.sectionTitle]}>
        {title}
      </Text>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.md },
  lead: { marginTop: space.xxs },
  section: { marginTop: space.lg },
  sectionTitle: { marginBottom: space.sm },
});
