/**
 * A stand-in for expo-router in component tests, which run without a navigation container:
 *   jest.mock('expo-router', () => require('@/components/testing/expoRouter'));
 * Links render as anchors (or pass href to their asChild child); the current path is set with setPathname.
 */
import { cloneElement, isValidElement, type ReactNode } from 'react';

let pathname = '/';

export function setPathname(next: string) {
  pathname = next;
}

export function usePathname() {
  return pathname;
}

interface LinkProps {
  href: string;
  asChild?: boolean;
  children?: ReactNode;
  testID?: string;
}

export function Link({ href, asChild, children, testID }: LinkProps) {
  if (asChild && isValidElement<{ style?: unknown }>(children)) {
    // Like expo-router's Slot, which spreads the child's style into an object.
    const { style } = children.props;
    if (style != null && (typeof style !== 'object' || Array.isArray(style))) {
      throw new Error('Link asChild: the child needs a plain style object');
    }
    return cloneElement(children, { href, role: 'link' } as Record<string, unknown>);
  }
  return (
    <a href={href} data-testid={testID}>
      {children}
    </a>
  );
}
