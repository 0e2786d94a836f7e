import { Link, usePathname } from 'expo-router';
import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { RoleGate } from '../account/RoleGate';
import { colors, focusRing, space, type } from '../theme';
import { Screen } from '../ui/Screen';

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

/** Every admin screen: its title, the three admin pages as tabs, and the content for admins only. */
export function AdminFrame({ testID, title, lead, children }: AdminFrameProps) {
  return (
    <Screen testID={testID} title={title} lead={lead}>
      <RoleGate section="admin">
        <AdminTabs />
        {children}
      </RoleGate>
    </Screen>
  );
}

function AdminTabs() {
  const pathname = usePathname();
  return (
    <View role="navigation" aria-label="Admin pages" style={styles.tabs}>
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
    paddingVertical: space.xs,
    borderBottomColor: 'transparent',
    borderBottomWidth: 3,
    marginBottom: -1,
  },
  current: { fontFamily: type.uiStrong.fontFamily, color: colors.teal, borderBottomColor: colors.teal },
});
