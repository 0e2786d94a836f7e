import { usePathname } from 'expo-router';
import { useEffect, useRef, useState } from 'react';
import { Platform, Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, layout, radius, space, type } from '../theme';
import type { Role } from '../viewer';
import { SectionIcon } from './icons';
import { NavItem, navItemStyles, type NavVariant } from './NavItem';
import { barSectionsFor, isInSection, sectionsFor, type NavSection } from './sections';
import { Wordmark } from './Wordmark';

interface NavigationProps {
  variant: Exclude<NavVariant, 'sheet'>;
  role: Role;
}

/**
 * The sections a role is offered: a left rail on a wide screen; on a phone, a bottom bar of at most
 * five destinations, the last of them "More" when the role has more sections than fit.
 */
export function Navigation({ variant, role }: NavigationProps) {
  const pathname = usePathname();
  if (variant === 'rail') {
    return (
      <View role="navigation" aria-label="Sections" testID="nav-rail" style={styles.rail}>
        <View style={styles.masthead}>
          <Wordmark />
          <Text style={type.small}>Objections, written once.</Text>
        </View>
        {sectionsFor(role).map((section) => (
          <NavItem key={section.key} section={section} active={isInSection(pathname, section)} variant="rail" />
        ))}
      </View>
    );
  }
  const { bar, more } = barSectionsFor(role);
  return (
    <View role="navigation" aria-label="Sections" testID="nav-bar" style={styles.bar}>
      {bar.map((section) => (
        <NavItem key={section.key} section={section} active={isInSection(pathname, section)} variant="bar" />
      ))}
      {more.length > 0 ? <More sections={more} pathname={pathname} /> : null}
    </View>
  );
}

/**
 * "More": one destination in the bar that opens the list of the sections that did not fit (a
 * disclosure: the button says whether the list is open). Escape, a tap elsewhere or choosing a section
 * closes it; focus goes into the list when it opens and back to the button when Escape closes it.
 */
function More({ sections, pathname }: { sections: NavSection[]; pathname: string }) {
  const [open, setOpen] = useState(false);
  const [hovered, setHovered] = useState(false);
  const button = useRef<View>(null);
  const list = useRef<View>(null);
  const active = sections.some((section) => isInSection(pathname, section));
  const tint = active || open ? colors.teal : colors.inkMuted;

  // A new page closes the list.
  useEffect(() => setOpen(false), [pathname]);

  useEffect(() => {
    if (!open || Platform.OS !== 'web') return;
    const listEl = list.current as unknown as HTMLElement | null;
    const buttonEl = button.current as unknown as HTMLElement | null;
    listEl?.querySelector<HTMLElement>('a')?.focus();
    const onKey = (e: KeyboardEvent) => {
      if (e.key !== 'Escape') return;
      setOpen(false);
      buttonEl?.focus();
    };
    const onPointer = (e: Event) => {
      const target = e.target as Node | null;
      if (target && !listEl?.contains(target) && !buttonEl?.contains(target)) setOpen(false);
    };
    document.addEventListener('keydown', onKey);
    document.addEventListener('pointerdown', onPointer);
    return () => {
      document.removeEventListener('keydown', onKey);
      document.removeEventListener('pointerdown', onPointer);
    };
  }, [open]);

  return (
    <>
      <Pressable
        ref={button}
        role="button"
        testID="nav-more"
        aria-expanded={open}
        aria-controls="nav-more-list"
        aria-label={active ? `More sections (the current page is among them)` : 'More sections'}
        onPress={() => setOpen((was) => !was)}
        onHoverIn={() => setHovered(true)}
        onHoverOut={() => setHovered(false)}
        style={[navItemStyles.item, navItemStyles.barItem, hovered && navItemStyles.hovered]}
      >
        <View style={[styles.barMark, active && navItemStyles.markActive]} />
        <SectionIcon name="more" color={tint} />
        <Text style={[navItemStyles.barLabel, (active || open) && navItemStyles.labelActive]} numberOfLines={1}>
          More
        </Text>
      </Pressable>
      <View ref={list} id="nav-more-list" testID="nav-more-list" style={[styles.sheet, !open && styles.closed]}>
        <Text style={styles.sheetTitle}>More sections</Text>
        {sections.map((section) => (
          <NavItem
            key={section.key}
            section={section}
            active={isInSection(pathname, section)}
            variant="sheet"
            onNavigate={() => setOpen(false)}
          />
        ))}
      </View>
    </>
  );
}

const styles = StyleSheet.create({
  bar: {
    position: 'relative',
    flexDirection: 'row',
    backgroundColor: colors.paperDeep,
    borderTopColor: colors.rule,
    borderTopWidth: 1,
  },
  rail: {
    width: layout.railWidth,
    backgroundColor: colors.paperDeep,
    borderRightColor: colors.rule,
    borderRightWidth: 1,
    paddingBottom: space.lg,
  },
  masthead: {
    gap: space.xxs,
    paddingHorizontal: space.lg,
    paddingTop: space.xl,
    paddingBottom: space.lg,
  },
  barMark: { position: 'absolute', top: 0, left: space.sm, right: space.sm, height: 3 },
  sheet: {
    position: 'absolute',
    bottom: '100%',
    right: space.xs,
    minWidth: 220,
    marginBottom: space.xs,
    paddingVertical: space.xs,
    backgroundColor: colors.surface,
    borderColor: colors.ruleStrong,
    borderWidth: 1,
    borderRadius: radius.md,
    zIndex: 10,
  },
  closed: { display: 'none' },
  sheetTitle: { ...type.small, paddingHorizontal: space.lg, paddingVertical: space.xxs },
});
