import type { ReactNode } from 'react';
import { View } from 'react-native';
import { Section } from '../ui/Screen';
import { sectionAnchor, sectionTitles, type SectionField } from './sections';

/**
 * One section of an entry under its title, as `entry-section-<field>`; on the web its anchor
 * (`id="section-<field>"`) is what the table of contents and the jump menu scroll to.
 */
export function EntrySection({ field, children }: { field: SectionField; children: ReactNode }) {
  return (
    <View testID={`entry-section-${field}`} nativeID={sectionAnchor(field)}>
      <Section title={sectionTitles[field]}>{children}</Section>
    </View>
  );
}
