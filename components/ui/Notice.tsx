import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import Svg, { Circle, Line, Path } from 'react-native-svg';
import { colors, radius, space, type } from '../theme';
import { dataAttributes } from '../worksheet/dataAttributes';

/**
 * What kind of message a notice is:
 * - `success`: something the reader did went through ("Sent. Thank you.");
 * - `empty`: a list with nothing in it yet, and what comes next;
 * - `warning`: something to know before going on (a caution, a read-only draft);
 * - `error`: something failed, and how to put it right.
 */
export type NoticeTone = 'success' | 'empty' | 'warning' | 'error';

interface NoticeProps {
  title: string;
  children?: ReactNode;
  /** The kind of message; without it, a notice with `role="alert"` is an error and any other a warning. */
  tone?: NoticeTone;
  /**
   * `alert` for failures, so assistive technology reads them out when they appear; `status` for news
   * that can wait its turn. Errors are alerts and successes statuses whatever this says.
   */
  role?: 'alert' | 'status';
  testID?: string;
  action?: ReactNode;
}

/**
 * Each tone is told by more than colour: its own mark (a tick, an empty dashed ring, a triangle, a
 * cross), its own edge (solid, dashed, double-width), and a word that assistive technology reads first.
 */
const tones: Record<NoticeTone, { word: string; edge: string; wash: string; ink: string }> = {
  success: { word: 'Done', edge: colors.teal, wash: colors.tealWash, ink: colors.teal },
  empty: { word: 'Nothing here yet', edge: colors.ruleStrong, wash: colors.paperDeep, ink: colors.inkMuted },
  warning: { word: 'Note', edge: colors.brass, wash: colors.brassWash, ink: colors.brassInk },
  error: { word: 'Problem', edge: colors.alarm, wash: colors.alarmWash, ink: colors.alarmInk },
};

/** The tone a notice takes: the one asked for, or an error for an alert and a warning otherwise. */
export function toneOf(tone: NoticeTone | undefined, role: NoticeProps['role']): NoticeTone {
  return tone ?? (role === 'alert' ? 'error' : 'warning');
}

/** Something the reader should know about the page itself: news of an action, an empty list, a caution, a failure. */
export function Notice({ title, children, tone, role, testID, action }: NoticeProps) {
  const kind = toneOf(tone, role);
  const look = tones[kind];
  const liveRole = kind === 'error' ? 'alert' : kind === 'success' ? 'status' : role;
  return (
    <View
      role={liveRole}
      testID={testID}
      // `data-tone`, read by tests and print styles; the words and marks carry the meaning for people.
      {...dataAttributes({ tone: kind })}
      style={[styles.notice, { backgroundColor: look.wash, borderLeftColor: look.edge }, kindStyles[kind]]}
    >
      <View style={styles.mark} aria-hidden>
        <ToneMark tone={kind} color={look.ink} />
      </View>
      <View style={styles.words}>
        <Text style={type.uiStrong}>
          <Text style={styles.hidden} testID={testID && `${testID}-tone`}>
            {`${look.word}: `}
          </Text>
          {title}
        </Text>
        {children ? <Text style={type.body}>{children}</Text> : null}
        {action}
      </View>
    </View>
  );
}

/** The mark of a tone, 20 px: drawn here, in the tone's ink. */
function ToneMark({ tone, color }: { tone: NoticeTone; color: string }) {
  const line = { stroke: color, strokeWidth: 1.8, strokeLinecap: 'round' as const, fill: 'none' };
  return (
    <Svg width={20} height={20} viewBox="0 0 20 20" testID={`notice-mark-${tone}`}>
      {tone === 'success' ? (
        <>
          <Circle cx={10} cy={10} r={8.2} {...line} />
          <Path d="M6 10.4 L8.8 13.1 L14.2 7.2" {...line} strokeLinejoin="round" />
        </>
      ) : null}
      {tone === 'empty' ? <Circle cx={10} cy={10} r={8.2} {...line} strokeDasharray="3 2.6" /> : null}
      {tone === 'warning' ? (
        <>
          <Path d="M10 2.2 L18.2 17 L1.8 17 Z" {...line} strokeLinejoin="round" />
          <Line x1={10} y1={7.6} x2={10} y2={11.8} {...line} />
          <Circle cx={10} cy={14.4} r={0.6} {...line} />
        </>
      ) : null}
      {tone === 'error' ? (
        <>
          <Path d="M6.6 1.8 H13.4 L18.2 6.6 V13.4 L13.4 18.2 H6.6 L1.8 13.4 V6.6 Z" {...line} strokeLinejoin="round" />
          <Line x1={7} y1={7} x2={13} y2={13} {...line} />
          <Line x1={13} y1={7} x2={7} y2={13} {...line} />
        </>
      ) : null}
    </Svg>
  );
}

const styles = StyleSheet.create({
  notice: {
    flexDirection: 'row',
    gap: space.sm,
    borderLeftWidth: 3,
    borderRadius: radius.sm,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
  },
  mark: { paddingTop: 1 },
  words: { flex: 1, gap: space.xs, minWidth: 0 },
  /** Out of sight, still read: the tone's word before the title. */
  hidden: {
    position: 'absolute',
    width: 1,
    height: 1,
    margin: -1,
    padding: 0,
    overflow: 'hidden',
    opacity: 0,
  },
});

/** The edge of each tone differs in form, not only in colour. */
const kindStyles = StyleSheet.create({
  success: {},
  empty: { borderLeftWidth: 0, borderWidth: 1, borderStyle: 'dashed', borderColor: colors.ruleStrong },
  warning: {},
  error: { borderLeftWidth: 6 },
});
