import { Link } from 'expo-router';
import { useState } from 'react';
import { Platform, Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, focusRing, space, type } from '../theme';
import type { NavSection } from './sections';

export type NavVariant = 'bar' | 'rail';

interface NavItemProps {
  section: NavSection;
  active: boolean;
  variant: NavVariant;
  /** A bar crowded with sections (an admin has seven): smaller labels, so that each word fits a phone. */
  compact?: boolean;
}

/** One section in the bottom bar or the rail; the active one is teal and announced as current. */
export function NavItem({ section, active, variant, compact = false }: NavItemProps) {
  const [hovered, setHovered] = useState(false);
  const current =
    Platform.OS === 'web'
      ? { 'aria-current': active ? ('page' as const) : undefined }
      : { accessibilityState: { selected: active } };

  return (
    <Link href={section.href} asChild>
      <Pressable
        testID={`nav-${section.key}`}
        {...current}
        onHoverIn={() => setHovered(true)}
        onHoverOut={() => setHovered(false)}
        // Link's asChild merges props into its child and takes only a plain style object.
        style={StyleSheet.flatten([
          styles.item,
          variant === 'bar' ? styles.barItem : styles.railItem,
          hovered && !active && styles.hovered,
          active && variant === 'rail' && styles.railActive,
        ])}
      >
        <View style={[variant === 'bar' ? styles.barMark : styles.railMark, active && styles.markActive]} />
        <Text
          style={[variant === 'bar' ? styles.barLabel : styles.railLabel, compact && styles.compactLabel, active && styles.labelActive]}
          // In a crowded bar a label of two words takes a second line.
          numberOfLines={variant === 'bar' ? 2 : 1}
        >
          {section.label}
        </Text>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  item: { ...focusRing, position: 'relative' },
  barItem: {
    flex: 1,
    alignItems: 'center',
    justifyContent: 'center',
    minHeight: 56,
    paddingHorizontal: space.xxs,
  },
  railItem: {
    paddingVertical: space.sm,
    paddingLeft: space.lg,
    paddingRight: space.md,
  },
  hovered: { backgroundColor: colors.paper },
  railActive: { backgroundColor: colors.tealWash },
  barMark: { position: 'absolute', top: 0, left: space.sm, right: space.sm, height: 3 },
  railMark: { position: 'absolute', top: 0, bottom: 0, left: 0, width: 3 },
  markActive: { backgroundColor: colors.teal },
  barLabel: { ...type.caption, color: colors.inkMuted, textAlign: 'center' },
  compactLabel: { fontSize: type.small.fontSize, lineHeight: type.small.lineHeight },
  railLabel: { ...type.ui, color: colors.inkMuted },
  labelActive: { fontFamily: type.uiStrong.fontFamily, color: colors.teal },
});
