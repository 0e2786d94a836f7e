import { usePathname } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import { colors, layout, space, type } from '../theme';
import type { Role } from '../viewer';
import { NavItem, type NavVariant } from './NavItem';
import { isInSection, sectionsFor } from './sections';
import { Wordmark } from './Wordmark';

interface NavigationProps {
  variant: NavVariant;
  role: Role;
}

/** The sections a role is offered: a bottom bar on a phone, a left rail on a wide screen. */
export function Navigation({ variant, role }: NavigationProps) {
  const pathname = usePathname();
  const bar = variant === 'bar';
  const offered = sectionsFor(role);
  const items = offered.map((section) => (
    <NavItem
      key={section.key}
      section={section}
      active={isInSection(pathname, section)}
      variant={variant}
      compact={bar && offered.length > 5}
    />
  ));

  return (
    <View role="navigation" aria-label="Sections" testID={bar ? 'nav-bar' : 'nav-rail'} style={bar ? styles.bar : styles.rail}>
      {bar ? null : (
        <View style={styles.masthead}>
          <Wordmark />
          <Text style={type.small}>Objections, written once.</Text>
        </View>
      )}
      {items}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: {
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
});
