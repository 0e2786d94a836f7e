import { Link } from 'expo-router';
import type { ReactNode } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { checkList } from '@/shared/checks';
import { useWorksheetList } from '../queries/worksheets';
import { colors, focusRing, space, type } from '../theme';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { Screen, Section } from '../ui/Screen';

/** The standard check kit and the starter worksheets, each a link to its own screen. */
export function CheckListScreen() {
  return (
    <Screen
      testID="screen-checks"
      title="Check kit"
      lead="The standard calculations behind most objections. Each runs in your browser on the claim's own figures, in whatever units the claim uses, and says in words whether its condition holds."
    >
      <Section title="Checks">
        <View role="list" style={styles.list}>
          {checkList.map((def) => (
            <ListLink key={def.name} href={`/checks/${def.name}`} testID={`check-link-${def.name}`} title={def.title}>
              <Text style={type.body}>{def.summary}</Text>
              <Text style={type.caption}>
                Holds when <Text style={styles.condition}>{def.condition}</Text>
              </Text>
            </ListLink>
          ))}
        </View>
      </Section>
      <Section title="Worksheets">
        <Text style={[type.body, styles.intro]}>
          Worked counter-calculations, step by step, with inputs you can change in place.
        </Text>
        <WorksheetList />
      </Section>
    </Screen>
  );
}

function WorksheetList() {
  const { data, error, isPending, refetch } = useWorksheetList();
  if (isPending) return <Loading testID="worksheets-loading" label="Loading the worksheets…" />;
  if (error) {
    return <ErrorNotice testID="worksheets-error" error={error} what="the list of worksheets" onRetry={() => void refetch()} />;
  }
  if (data.worksheets.length === 0) {
    return (
      <Notice tone="empty" testID="worksheets-empty" title="No worksheets yet.">
        Starter worksheets are read from <Text style={type.mono}>content/worksheets/</Text> when the server starts. Add
        one there and restart, or use the checks above meanwhile.
      </Notice>
    );
  }
  return (
    <View role="list" style={styles.list}>
      {data.worksheets.map((ws) => (
        <ListLink key={ws.name} href={`/worksheets/${ws.name}`} testID={`worksheet-link-${ws.name}`} title={ws.title}>
          {ws.summary ? <Text style={type.body}>{ws.summary}</Text> : null}
        </ListLink>
      ))}
    </View>
  );
}

interface ListLinkProps {
  href: string;
  testID: string;
  title: string;
  children: ReactNode;
}

/** A list item that is one link: its title in the accent, then what it is about. */
function ListLink({ href, testID, title, children }: ListLinkProps) {
  return (
    <View role="listitem" style={styles.item}>
      <Link href={href} asChild>
        {/* Link's asChild merges props into its child and takes only a plain style object. */}
        <Pressable testID={testID} style={StyleSheet.flatten(styles.link)}>
          <Text style={styles.title}>{title}</Text>
          {children}
        </Pressable>
      </Link>
    </View>
  );
}

const styles = StyleSheet.create({
  list: { borderTopColor: colors.rule, borderTopWidth: 1 },
  item: { borderBottomColor: colors.rule, borderBottomWidth: 1 },
  link: { ...focusRing, gap: space.xxs, paddingVertical: space.md },
  title: { ...type.heading, color: colors.teal },
  condition: { ...type.mono, fontSize: 13, color: colors.ink },
  intro: { marginBottom: space.sm },
});
