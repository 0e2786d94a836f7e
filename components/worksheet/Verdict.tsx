import { StyleSheet, Text, View } from 'react-native';
import Svg, { Circle, Line } from 'react-native-svg';
import { readableText } from '@/shared/format/numbers';
import { colors, radius, space, type } from '../theme';
import { dataAttributes } from './dataAttributes';
import { Formula } from './Symbolic';

/**
 * A neutral mark in graphite: a ring when the condition holds, a struck ring when it does not,
 * a broken ring when it could not be evaluated. Words say the same; the mark is never a colour code.
 */
function ConditionMark({ holds }: { holds: boolean | undefined }) {
  return (
    <Svg width={20} height={20} aria-hidden>
      <Circle cx={10} cy={10} r={7.5} fill="none" stroke={colors.ink} strokeWidth={1.6} strokeDasharray={holds === undefined ? '3 3' : undefined} />
      {holds === false ? <Line x1={4.7} y1={15.3} x2={15.3} y2={4.7} stroke={colors.ink} strokeWidth={1.6} /> : null}
    </Svg>
  );
}

interface VerdictProps {
  testID: string;
  /** Undefined when the condition could not be evaluated. */
  holds: boolean | undefined;
  /** A worksheet check's name in words; a check screen has only its condition. */
  title?: string;
  /** The condition, e.g. "claimed thrust ≤ P/c". */
  condition: string;
  /** The verdict in words with the numbers, or why it could not be reached. */
  message: string;
  /** Names in `condition` to show as symbols (a worksheet's inputs, steps and constants). */
  symbols?: ReadonlySet<string>;
}

/** Whether a condition holds, told in words with a neutral mark; `data-holds` carries it for tests. */
export function Verdict({ testID, holds, title, condition, message, symbols }: VerdictProps) {
  const status = holds === undefined ? 'Not evaluated' : holds ? 'Holds' : 'Does not hold';
  return (
    <View testID={testID} {...(holds === undefined ? {} : dataAttributes({ holds: String(holds) }))} style={styles.box}>
      <View style={styles.head}>
        <ConditionMark holds={holds} />
        <Text style={styles.status}>{title ? `${status} · ${title}` : status}</Text>
      </View>
      {symbols ? <Formula text={condition} names={symbols} style={styles.condition} /> : <Text style={styles.condition}>{condition}</Text>}
      <Text style={type.body}>{readableText(message)}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    gap: space.xs,
    backgroundColor: colors.surface,
    borderColor: colors.ruleStrong,
    borderWidth: 1,
    borderLeftColor: colors.ink,
    borderLeftWidth: 3,
    borderRadius: radius.sm,
    padding: space.md,
  },
  head: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xs },
  status: { ...type.uiStrong, flexShrink: 1 },
  condition: { ...type.mono, color: colors.inkMuted },
});
