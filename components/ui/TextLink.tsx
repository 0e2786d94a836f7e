import { Link } from 'expo-router';
import type { ReactNode } from 'react';
import { StyleSheet } from 'react-native';
import { colors, focusRing, type } from '../theme';

interface TextLinkProps {
  /** A path in the app ("/sign-in?next=%2Fadmin") or a full address. */
  href: string;
  children: ReactNode;
  testID?: string;
  /** `inline` inside running text; otherwise a link that stands on its own line. */
  inline?: boolean;
}

/** A link in words: teal and underlined, a real anchor on the web. */
export function TextLink({ href, children, testID, inline = false }: TextLinkProps) {
  return (
    <Link href={href} testID={testID} style={inline ? styles.inline : styles.block}>
      {children}
    </Link>
  );
}

const styles = StyleSheet.create({
  block: { ...type.uiStrong, ...focusRing, alignSelf: 'flex-start', color: colors.teal, textDecorationLine: 'underline' },
  inline: { ...focusRing, color: colors.teal, textDecorationLine: 'underline' },
});
