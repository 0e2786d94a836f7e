/**
 * `data-*` attributes on the web. react-native-web renders a `dataSet` prop as data attributes
 * (`dataSet={{ si: '0.001' }}` → `data-si="0.001"`), but React Native's types do not declare it,
 * so it is spread in from here, the one place that knows.
 */
export function dataAttributes(data: Record<string, string>): object {
  return { dataSet: data };
}
