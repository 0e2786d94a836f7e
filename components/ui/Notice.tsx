import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { colors, radius, space, type } from '../theme';

interface NoticeProps {
  title: string;
  children?: ReactNode;
  /** `alert` for failures, so assistive technology reads them out when they appear. */
  role?: 'alert';
  testID?: string;
  action?: ReactNode;
}

/** Something the reader should know about the page itself: a failure, or an empty list and what comes next. */
export function Notice({ title, children, role, testID, action }: NoticeProps) {
  return (
    <View role={role} testID={testID} style={styles.notice}>
      <Text style={type.uiStrong}>{title}</Text>
      {children ? <Text style={type.body}>{children}</Text> : null}
      {action}
    </View>
  );
}

const styles = StyleSheet.create({
  notice: {
    gap: space.xs,
    backgroundColor: colors.brassWash,
    borderLeftColor: colors.brass,
    borderLeftWidth: 3,
    borderRadius: radius.sm,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
  },
});
