import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { AuditEventDto } from '@/shared/api-types';
import { pageQuerySchema } from '@/shared/schemas/auth';
import { useAuditLog } from '../queries/admin';
import { QUEUE_STATUS_WORDS } from '../submissions/words';
import { colors, space, type } from '../theme';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { AdminFrame } from './AdminFrame';
import { formatWhen } from './format';
import { Pager } from './Pager';

const PAGE = 50;

/** Admin: the append-only audit log, newest first: who did what to which record, when, before and after. */
export function AuditScreen() {
  return (
    <AdminFrame
      testID="screen-audit"
      title="Audit log"
      lead="Who did what to which record, and when, newest first. Nothing here can be edited or removed."
    >
      <AuditList />
    </AdminFrame>
  );
}

function AuditList() {
  const [offset, setOffset] = useState(0);
  const page = pageQuerySchema.parse({ limit: PAGE, offset });
  const { data, error, isPending, isFetching, refetch } = useAuditLog(page);

  if (isPending) return <Loading testID="audit-loading" label="Loading the audit log…" />;
  if (error) return <ErrorNotice testID="audit-error" error={error} what="the audit log" onRetry={() => void refetch()} />;
  if (data.events.length === 0) {
    return (
      <Notice tone="empty" testID="audit-empty" title="Nothing is recorded yet.">
        Changing a user&apos;s role on the Users and roles page writes the first event here.
      </Notice>
    );
  }
  return (
    <View style={styles.body}>
      <View role="list" testID="audit-list" style={styles.list}>
        {data.events.map((event) => (
          <AuditRow key={event.id} event={event} />
        ))}
      </View>
      <Pager
        offset={offset}
        limit={PAGE}
        total={data.total}
        shown={data.events.length}
        noun={data.total === 1 ? 'event' : 'events'}
        onOffset={setOffset}
        busy={isFetching}
      />
    </View>
  );
}

function AuditRow({ event }: { event: AuditEventDto }) {
  return (
    <View role="listitem" testID="audit-event" style={styles.row}>
      <View style={styles.head}>
        <Text testID="audit-sentence" style={styles.sentence}>
          {event.sentence.map((part, i) =>
            part.title ? (
              <Text key={i} style={styles.title}>
                {part.text}
              </Text>
            ) : (
              part.text
            ),
          )}
        </Text>
        <Text testID="audit-when" style={type.caption}>
          {formatWhen(event.at)}
        </Text>
      </View>
      <View testID="audit-change" style={styles.change}>
        {describeChange(event.before, event.after, event.subjectType).map((line) => (
          <Text key={line.field} style={styles.line}>
            {line.field ? <Text style={type.caption}>{fieldWords(line.field)}: </Text> : null}
            {line.before} <Text style={styles.arrow}>→</Text> {line.after}
          </Text>
        ))}
      </View>
    </View>
  );
}

/** A record's field as words: `otherSessionsEnded` → "other sessions ended", `draftId` → "draft number". */
export function fieldWords(field: string): string {
  return field
    .replace(/Id$/, ' number')
    .replace(/([a-z])([A-Z])/g, '$1 $2')
    .replace(/_/g, ' ')
    .toLowerCase();
}

interface ChangeLine {
  field: string;
  before: string;
  after: string;
}

const isRecord = (value: unknown): value is Record<string, unknown> =>
  typeof value === 'object' && value !== null && !Array.isArray(value);

const show = (value: unknown): string =>
  value === undefined || value === null
    ? '(none)'
    : typeof value === 'string'
      ? value
      : Array.isArray(value)
        ? value.map(show).join(', ')
        : typeof value === 'boolean'
          ? value
            ? 'yes'
            : 'no'
          : JSON.stringify(value);

/** A submission's state in the queue's words ("in hand"), not its stored value ("claimed"). */
const stateWords = (subjectType: string, field: string, value: unknown): string =>
  subjectType === 'submission' && field === 'status' && typeof value === 'string' && value in QUEUE_STATUS_WORDS
    ? QUEUE_STATUS_WORDS[value as keyof typeof QUEUE_STATUS_WORDS].toLowerCase()
    : show(value);

/**
 * Before → after, field by field where both are records (`role: contributor → editor`), else as a
 * whole. Row numbers (`claimedById`, `draftId`) are left out: the sentence names the people and records.
 */
function describeChange(before: unknown, after: unknown, subjectType = ''): ChangeLine[] {
  if (isRecord(before) || isRecord(after)) {
    const b = isRecord(before) ? before : {};
    const a = isRecord(after) ? after : {};
    const fields = [...new Set([...Object.keys(b), ...Object.keys(a)])].filter((field) => !/Id$/.test(field));
    const changed = fields.filter((field) => JSON.stringify(b[field]) !== JSON.stringify(a[field]));
    if (changed.length > 0) return changed.map((field) => ({ field, before: stateWords(subjectType, field, b[field]), after: stateWords(subjectType, field, a[field]) }));
    if (fields.length === 0) return [];
  }
  return [{ field: '', before: show(before), after: show(after) }];
}

const styles = StyleSheet.create({
  body: { gap: space.md },
  list: { borderTopColor: colors.rule, borderTopWidth: 1 },
  row: { gap: space.xxs, paddingVertical: space.md, borderBottomColor: colors.rule, borderBottomWidth: 1 },
  head: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'baseline', gap: space.xs },
  sentence: { ...type.ui, color: colors.ink, flexShrink: 1 },
  title: { fontStyle: 'italic' },
  change: { gap: 2, marginTop: space.xxs },
  line: { ...type.mono },
  arrow: { color: colors.brass },
});
