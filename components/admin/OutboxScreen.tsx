import { Platform, StyleSheet, Text, View, type TextStyle } from 'react-native';
import type { OutboxMessageDto } from '@/shared/api-types';
import { ApiError } from '../http/client';
import { useOutbox } from '../queries/admin';
import { colors, radius, space, type } from '../theme';
import { Button } from '../ui/Button';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { TextLink } from '../ui/TextLink';
import { AdminFrame } from './AdminFrame';
import { formatWhen } from './format';

/** Admin, in development: the mail the local fake SMTP server caught, newest first, links ready to follow. */
export function OutboxScreen() {
  return (
    <AdminFrame
      testID="screen-outbox"
      title="Outbox"
      lead="In development, mail never leaves this machine: a local stand-in for the mail server catches every message, and it shows here, newest first. Follow a link in a message as its addressee would."
    >
      <Messages />
    </AdminFrame>
  );
}

function Messages() {
  const { data, error, isPending, isFetching, refetch } = useOutbox();

  if (isPending) return <Loading testID="outbox-loading" label="Loading the caught mail…" />;
  if (error instanceof ApiError && error.status === 404) {
    return (
      <Notice testID="outbox-off" title="There is no outbox on this server.">
        The outbox exists only in development. In production the app hands its mail to the real mail server, and
        nothing is kept here.
      </Notice>
    );
  }
  if (error) return <ErrorNotice testID="outbox-error" error={error} what="the outbox" onRetry={() => void refetch()} />;

  return (
    <View style={styles.body}>
      <Button
        testID="outbox-refresh"
        variant="quiet"
        label="Look for new mail"
        busyLabel="Looking…"
        busy={isFetching}
        onPress={() => void refetch()}
      />
      {data.messages.length === 0 ? (
        <Notice tone="empty" testID="outbox-empty" title="No mail caught yet.">
          Mail arrives here when someone creates an account, asks for the confirmation link again, or asks to set a new
          password. Try it: create an account at /sign-up, then look for new mail.
        </Notice>
      ) : (
        <View role="list" testID="outbox-list" style={styles.list}>
          {data.messages.map((message) => (
            <MessageCard key={message.id} message={message} />
          ))}
        </View>
      )}
    </View>
  );
}

function MessageCard({ message }: { message: OutboxMessageDto }) {
  return (
    <View role="listitem" testID="outbox-message" style={styles.card}>
      <Text role="heading" aria-level={2} style={type.heading}>
        {message.subject}
      </Text>
      <Text style={type.caption}>
        To <Text style={styles.address}>{message.to}</Text> · from <Text style={styles.address}>{message.from}</Text> ·{' '}
        {formatWhen(message.receivedAt)}
      </Text>
      <Text testID="outbox-text" style={styles.text}>
        {withLinks(message.text)}
      </Text>
    </View>
  );
}

const URL_PATTERN = /https?:\/\/[^\s<>"']+/g;

/** The text body with each web address as a link; trailing punctuation stays text. */
function withLinks(text: string) {
  const parts: (string | { url: string })[] = [];
  let last = 0;
  for (const match of text.matchAll(URL_PATTERN)) {
    const url = match[0].replace(/[.,;:!?)\]]+$/, '');
    const start = match.index;
    parts.push(text.slice(last, start), { url });
    last = start + url.length;
  }
  parts.push(text.slice(last));
  return parts.map((part, i) =>
    typeof part === 'string' ? (
      part
    ) : (
      <TextLink key={i} inline href={appHref(part.url)} testID="outbox-link">
        {part.url}
      </TextLink>
    ),
  );
}

/** A link to this app opens in the app (its path); any other address stays as it is. */
function appHref(url: string): string {
  if (Platform.OS !== 'web') return url;
  try {
    const parsed = new URL(url);
    if (parsed.origin === window.location.origin) return `${parsed.pathname}${parsed.search}${parsed.hash}`;
  } catch {
    // Not a URL after all: leave it as written.
  }
  return url;
}

const styles = StyleSheet.create({
  body: { gap: space.md },
  list: { gap: space.md },
  card: {
    gap: space.xs,
    padding: space.md,
    backgroundColor: colors.surface,
    borderColor: colors.rule,
    borderWidth: 1,
    borderRadius: radius.md,
  },
  address: { ...type.mono, fontSize: 13, color: colors.ink },
  // A token in a link may break anywhere rather than run off a phone's screen.
  text: { ...type.mono, fontSize: 13, lineHeight: 20, marginTop: space.xs, ...({ wordBreak: 'break-word' } as TextStyle) },
});
