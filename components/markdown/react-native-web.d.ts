/** react-native-web ships no types; this is the one export the app uses (components/markdown/Markdown.tsx). */
declare module 'react-native-web' {
  import type { ReactElement } from 'react';

  /** Renders a DOM element with react-native-web's props and styles (its documented escape hatch). */
  export function unstable_createElement(type: string, props?: Record<string, unknown>): ReactElement;
}
