import type { ReactNode } from 'react';
import { View } from 'react-native';
import { Section } from '../ui/Screen';
import { sectionTitles, type SectionField } from './sections';

/** One section of an entry under its title, as `entry-section-<field>`. */
export function EntrySection({ field, children }: { field: SectionField; children: ReactNode }) {
  return (
    <View testID={`entry-section-${field}`}>
      <Section title={sectionTitles[field]}>{children}</Section>
    </View>
  );
}
