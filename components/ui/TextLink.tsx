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
  // A link on its own line is a touch target of 44 px at least (WCAG 2.1, 2.5.5): 11 + 22 + 11.
  // Links inside running text keep the line's height, as the criterion allows.
  block: {
    ...type.uiStrong,
    ...focusRing,
    alignSelf: 'flex-start',
    minHeight: 44,
    paddingVertical: (44 - type.uiStrong.lineHeight) / 2,
    color: colors.teal,
    textDecorationLine: 'underline',
  },
  inline: { ...focusRing, color: colors.teal, textDecorationLine: 'underline' },
});
