import { Link } from 'expo-router';
import { useState } from 'react';
import { Platform, Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, focusRing, space, type } from '../theme';
import { SectionIcon } from './icons';
import type { NavSection } from './sections';

/** `bar`: the phone's bottom bar; `rail`: the wide screen's left rail; `sheet`: the list behind "More". */
export type NavVariant = 'bar' | 'rail' | 'sheet';

interface NavItemProps {
  section: NavSection;
  active: boolean;
  variant: NavVariant;
  /** Called after the item is pressed (the "More" list closes). */
  onNavigate?: () => void;
}

/** One section in the bottom bar, the rail or the "More" list; the active one is teal and announced as current. */
export function NavItem({ section, active, variant, onNavigate }: NavItemProps) {
  const [hovered, setHovered] = useState(false);
  const current =
    Platform.OS === 'web'
      ? { 'aria-current': active ? ('page' as const) : undefined }
      : { accessibilityState: { selected: active } };
  const bar = variant === 'bar';
  const tint = active ? colors.teal : colors.inkMuted;

  return (
    <Link href={section.href} asChild onPress={onNavigate}>
      <Pressable
        testID={`nav-${section.key}`}
        {...current}
        onHoverIn={() => setHovered(true)}
        onHoverOut={() => setHovered(false)}
        // Link's asChild merges props into its child and takes only a plain style object.
        style={StyleSheet.flatten([
          styles.item,
          bar ? styles.barItem : variant === 'rail' ? styles.railItem : styles.sheetItem,
          hovered && !active && styles.hovered,
          active && !bar && styles.railActive,
        ])}
      >
        <View style={[bar ? styles.barMark : styles.railMark, active && styles.markActive]} />
        {variant === 'rail' ? null : <SectionIcon name={section.key} color={tint} size={bar ? 24 : 22} />}
        <Text
          style={[bar ? styles.barLabel : styles.railLabel, active && styles.labelActive]}
          // One line always: the bar's labels are short words, the rail and the list have room.
          numberOfLines={1}
        >
          {bar ? section.short : section.label}
        </Text>
      </Pressable>
    </Link>
  );
}

export const navItemStyles = StyleSheet.create({
  item: { ...focusRing, position: 'relative' },
  barItem: {
    flex: 1,
    minWidth: 44,
    alignItems: 'center',
    justifyContent: 'center',
    gap: 2,
    minHeight: 56,
    paddingHorizontal: space.xxs,
    paddingVertical: space.xxs,
  },
  hovered: { backgroundColor: colors.paper },
  barMark: { position: 'absolute', top: 0, left: space.sm, right: space.sm, height: 3 },
  markActive: { backgroundColor: colors.teal },
  barLabel: { ...type.small, color: colors.inkMuted, textAlign: 'center' },
  labelActive: { fontFamily: type.uiStrong.fontFamily, color: colors.teal },
});

const styles = StyleSheet.create({
  ...navItemStyles,
  railItem: {
    minHeight: 44,
    justifyContent: 'center',
    paddingVertical: space.sm,
    paddingLeft: space.lg,
    paddingRight: space.md,
  },
  sheetItem: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.sm,
    minHeight: 48,
    paddingLeft: space.lg,
    paddingRight: space.lg,
  },
  railActive: { backgroundColor: colors.tealWash },
  railMark: { position: 'absolute', top: 0, bottom: 0, left: 0, width: 3 },
  railLabel: { ...type.ui, color: colors.inkMuted },
});
