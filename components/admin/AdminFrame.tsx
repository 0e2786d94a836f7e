import { Link, usePathname } from 'expo-router';
import { useEffect, useState, type ReactNode } from 'react';
import { Pressable, StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { RoleGate } from '../account/RoleGate';
import { colors, focusRing, layout, radius, space, type } from '../theme';
import { Screen } from '../ui/Screen';
import { SITE_NAME, usePageTitle } from '../ui/usePageTitle';

const tabs = [
  { href: '/admin', label: 'Users and roles', testID: 'admin-tab-users' },
  { href: '/admin/audit', label: 'Audit log', testID: 'admin-tab-audit' },
  { href: '/admin/outbox', label: 'Outbox', testID: 'admin-tab-outbox' },
] as const;

interface AdminFrameProps {
  testID: string;
  title: string;
  lead: string;
  children: ReactNode;
}

/**
 * Every admin screen: its title, the admin pages (tabs on a wide screen, one menu on a phone), and the
 * content for admins only.
 */
export function AdminFrame({ testID, title, lead, children }: AdminFrameProps) {
  const pathname = usePathname();
  // "Users and roles — Admin — Counterweight": the page's name from its tab, the screen titles repeat "Admin".
  usePageTitle(`${tabs.find((tab) => tab.href === pathname)?.label ?? title} — Admin — ${SITE_NAME}`);
  const { width } = useWindowDimensions();
  return (
    <Screen testID={testID} title={title} lead={lead}>
      <RoleGate section="admin">
        {width >= layout.wideMinWidth ? <AdminTabs /> : <AdminMenu />}
        {children}
      </RoleGate>
    </Screen>
  );
}

function AdminTabs() {
  const pathname = usePathname();
  return (
    <View role="navigation" aria-label="Admin pages" testID="admin-tabs" style={styles.tabs}>
      {tabs.map((tab) => {
        const current = pathname === tab.href;
        return (
          <Link
            key={tab.href}
            href={tab.href}
            testID={tab.testID}
            aria-current={current ? 'page' : undefined}
            style={[styles.tab, current && styles.current]}
          >
            {tab.label}
          </Link>
        );
      })}
    </View>
  );
}

/** On a phone: one control that names the current admin page and opens the list of them all. */
function AdminMenu() {
  const pathname = usePathname();
  const [open, setOpen] = useState(false);
  const here = tabs.find((tab) => tab.href === pathname) ?? tabs[0];
  useEffect(() => setOpen(false), [pathname]);
  return (
    <View role="navigation" aria-label="Admin pages" testID="admin-menu" style={styles.menu}>
      <Pressable
        role="button"
        testID="admin-menu-button"
        aria-expanded={open}
        aria-controls="admin-menu-list"
        onPress={() => setOpen((was) => !was)}
        style={styles.menuButton}
      >
        <Text style={type.caption}>Admin page</Text>
        <Text style={[type.uiStrong, styles.menuCurrent]} numberOfLines={1}>
          {here.label}
        </Text>
        <Text style={[type.ui, styles.chevron]} aria-hidden>
          {open ? '▴' : '▾'}
        </Text>
      </Pressable>
      {open ? (
        <View id="admin-menu-list" testID="admin-menu-list" style={styles.menuList}>
          {tabs.map((tab) => {
            const current = pathname === tab.href;
            return (
              <Link
                key={tab.href}
                href={tab.href}
                testID={tab.testID}
                aria-current={current ? 'page' : undefined}
                onPress={() => setOpen(false)}
                style={[styles.menuItem, current && styles.menuItemCurrent]}
              >
                {tab.label}
              </Link>
            );
          })}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  tabs: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    columnGap: space.lg,
    borderBottomColor: colors.rule,
    borderBottomWidth: 1,
  },
  tab: {
    ...type.ui,
    ...focusRing,
    color: colors.inkMuted,
    minHeight: 44,
    paddingVertical: (44 - 3 - type.ui.lineHeight) / 2,
    borderBottomColor: 'transparent',
    borderBottomWidth: 3,
    marginBottom: -1,
  },
  current: { fontFamily: type.uiStrong.fontFamily, color: colors.teal, borderBottomColor: colors.teal },
  menu: { gap: space.xs },
  menuButton: {
    ...focusRing,
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.xs,
    minHeight: 48,
    paddingHorizontal: space.md,
    backgroundColor: colors.surface,
    borderColor: colors.ruleStrong,
    borderWidth: 1,
    borderRadius: radius.sm,
  },
  menuCurrent: { flex: 1, color: colors.teal },
  chevron: { color: colors.inkMuted },
  menuList: {
    backgroundColor: colors.surface,
    borderColor: colors.ruleStrong,
    borderWidth: 1,
    borderRadius: radius.sm,
    paddingVertical: space.xxs,
  },
  menuItem: {
    ...type.ui,
    ...focusRing,
    minHeight: 44,
    paddingVertical: (44 - type.ui.lineHeight) / 2,
    paddingHorizontal: space.md,
    color: colors.ink,
  },
  menuItemCurrent: { fontFamily: type.uiStrong.fontFamily, color: colors.teal, backgroundColor: colors.tealWash },
});
