/**
 * The parts of a claim check's result that read the same whether the check was just run or opened
 * from a share link: the notes, the matching entries, the checks run and the referee paragraph.
 */
import { Link } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import { checks as kit } from '@/shared/checks';
import { FIGURE_KIND_LABEL } from '@/shared/claims/types';
import { colors, focusRing, radius, space, type } from '../theme';
import { Notice } from '../ui/Notice';
import { TextLink } from '../ui/TextLink';
import { ResultList, ResultRow } from '../worksheet/ResultRow';
import { Verdict } from '../worksheet/Verdict';
import type { ClaimCheckResult, ClaimCheckRun, ClaimMatch, Figure } from './api';
import { CopyButton } from './CopyButton';
import { roleWords } from './figures';

/** The path of an entry's permanent version, for a link inside the app. */
export const versionPath = (m: Pick<ClaimMatch, 'slug' | 'version'>) => `/entries/${encodeURIComponent(m.slug)}/v/${m.version}`;

export function ClaimNotes({ notes }: { notes: string[] }) {
  if (notes.length === 0) return null;
  return (
    <View testID="claim-notes" style={styles.notes}>
      {notes.map((note, i) => (
        <Text key={i} testID={`claim-note-${i}`} style={type.body}>
          {note}
        </Text>
      ))}
    </View>
  );
}

/** The entries the text matched, best first, each linking to the version cited. */
export function MatchList({ matches }: { matches: ClaimMatch[] }) {
  if (matches.length === 0) {
    return (
      <Notice testID="claim-matches-none" title="No entry matched this text closely.">
        Try the part of the text that describes the mechanism, or search the Library by its own words.
      </Notice>
    );
  }
  return (
    <View role="list" aria-label="Matching entries" testID="claim-matches" style={styles.list}>
      {matches.map((m, i) => (
        <View role="listitem" key={m.slug} testID={`claim-match-${m.slug}`} style={styles.row}>
          <View style={styles.matchHead}>
            <Text style={styles.rank}>{i + 1}.</Text>
            <Link href={versionPath(m)} testID={`claim-match-${m.slug}-link`} style={styles.matchTitle}>
              {m.title}
            </Link>
          </View>
          <Text style={type.caption}>
            Version {m.version} · match score {formatScore(m.score)}
          </Text>
          {m.words.length > 0 ? (
            <Text testID={`claim-match-${m.slug}-words`} style={type.caption}>
              Words that matched: <Text style={styles.words}>{m.words.join(', ')}</Text>
            </Text>
          ) : null}
          <Text style={type.body}>{m.inBrief}</Text>
        </View>
      ))}
    </View>
  );
}

const formatScore = (score: number) => (score >= 10 ? score.toFixed(0) : score.toPrecision(2));

/** The figures as the result read them, not editable (a shared check). */
export function FigureTable({ figures }: { figures: Figure[] }) {
  if (figures.length === 0) return <Text style={type.body}>No figures with units were found.</Text>;
  return (
    <View role="list" aria-label="Figures found" style={styles.list}>
      {figures.map((f) => (
        <View role="listitem" key={f.id} testID={`claim-figure-${f.id}`} style={styles.row}>
          <Text style={type.uiStrong}>
            {f.id} · {FIGURE_KIND_LABEL[f.kind]}
          </Text>
          <Text style={type.caption}>
            {f.start === null ? 'Typed by hand' : 'As written'}: <Text style={styles.words}>{f.text}</Text> · read as{' '}
            <Text style={styles.value}>{f.display}</Text> · role: {roleWords(f.role)}
          </Text>
        </View>
      ))}
    </View>
  );
}

/** Each check run: why it applies, the verdict, the computed figures, what was assumed, and a link to explore it. */
export function CheckRuns({ runs }: { runs: ClaimCheckRun[] }) {
  if (runs.length === 0) {
    return (
      <Notice testID="claim-checks-none" title="No check could be run on these figures.">
        The notes above say what is missing. Add a figure by hand and re-run to run the checks it allows.
      </Notice>
    );
  }
  return (
    <View style={styles.runs}>
      {runs.map((run) => (
        <View key={run.check} testID={`claim-check-${run.check}`} style={styles.run}>
          <Text role="heading" aria-level={3} style={type.heading}>
            {run.title}
          </Text>
          <Text style={type.body}>{run.why}</Text>
          <Text style={type.caption}>Figures used: {run.uses.length ? run.uses.join(', ') : 'none from the text'}</Text>
          <Verdict
            testID={`claim-check-${run.check}-verdict`}
            holds={run.verdict.holds}
            condition={kit[run.check]?.condition ?? ''}
            message={run.verdict.message}
          />
          <ResultList label={`Computed figures of ${run.title}`}>
            {run.outputs.map((o) => (
              <ResultRow key={o.name} testID={`claim-check-${run.check}-output-${o.name}`} label={o.label} value={o} />
            ))}
          </ResultList>
          {run.assumptions.length > 0 ? (
            <View style={styles.assumptions}>
              <Text style={type.uiStrong}>Assumed beyond the text</Text>
              {run.assumptions.map((a, i) => (
                <Text key={i} style={type.caption}>
                  • {a}
                </Text>
              ))}
            </View>
          ) : null}
          <TextLink href={run.permalink} testID={`claim-check-${run.check}-explore`}>
            Explore this check with these figures
          </TextLink>
        </View>
      ))}
    </View>
  );
}

/** The paste-ready paragraph with its numbered references, and a button that copies both. */
export function ParagraphPanel({ paragraph }: { paragraph: ClaimCheckResult['paragraph'] }) {
  return (
    <View style={styles.paragraphBox}>
      <View testID="claim-paragraph" style={styles.paragraph}>
        <Text selectable style={type.body}>
          {paragraph.body}
        </Text>
        {paragraph.references.length > 0 ? (
          <>
            <Text style={type.uiStrong}>References</Text>
            <View role="list" aria-label="References">
              {paragraph.references.map((r) => (
                <Text role="listitem" key={r.n} selectable testID={`claim-reference-${r.n}`} style={styles.reference}>
                  {r.n}. {r.text}
                </Text>
              ))}
            </View>
          </>
        ) : null}
      </View>
      <CopyButton testID="claim-copy" label="Copy paragraph and references" text={paragraph.text} fallback="the paragraph above" />
    </View>
  );
}

const styles = StyleSheet.create({
  notes: {
    gap: space.xs,
    borderLeftColor: colors.ruleStrong,
    borderLeftWidth: 3,
    paddingLeft: space.sm,
  },
  list: { borderTopColor: colors.rule, borderTopWidth: 1 },
  row: { gap: space.xxs, paddingVertical: space.sm, borderBottomColor: colors.rule, borderBottomWidth: 1 },
  matchHead: { flexDirection: 'row', gap: space.xs, alignItems: 'baseline' },
  rank: { ...type.uiStrong, color: colors.inkMuted },
  matchTitle: { ...type.uiStrong, ...focusRing, color: colors.teal, textDecorationLine: 'underline', flexShrink: 1 },
  words: { ...type.mono, fontSize: 13, color: colors.ink },
  value: { ...type.mono, fontSize: 13, color: colors.ink },
  runs: { gap: space.lg },
  run: { gap: space.sm },
  assumptions: { gap: space.xxs },
  paragraphBox: { gap: space.sm },
  paragraph: {
    gap: space.sm,
    backgroundColor: colors.surface,
    borderColor: colors.rule,
    borderWidth: 1,
    borderRadius: radius.sm,
    padding: space.sm,
  },
  reference: { ...type.body, fontSize: 15, lineHeight: 23, marginTop: space.xxs },
});
