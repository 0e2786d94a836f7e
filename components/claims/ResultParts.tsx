/**
 * The parts of a claim check's result that read the same whether the check was just run or opened
 * from a share link: the paste-ready paragraph (with its variants), the notes, the matching entries,
 * the figures, the checks run (each finding in words, with a neutral mark) and the checks that need
 * a figure the text does not give.
 */
import { Link } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import Svg, { Circle, Line } from 'react-native-svg';
import { checks as kit } from '@/shared/checks';
import { readableText as printText } from '@/shared/format/numbers';
import {
  FIGURE_KIND_LABEL,
  PARAGRAPH_VARIANT_LABEL,
  PARAGRAPH_VARIANTS,
  type ClaimCheckNeed,
  type ClaimParagraph,
  type ParagraphVariant,
} from '@/shared/claims/types';
import { ChoiceChips } from '../admin/ChoiceChips';
import { colors, focusRing, radius, space, type } from '../theme';
import { Notice } from '../ui/Notice';
import { TextLink } from '../ui/TextLink';
import { dataAttributes } from '../worksheet/dataAttributes';
import { ResultList, ResultRow } from '../worksheet/ResultRow';
import { CITATION_STYLE_LABEL, CITATION_STYLES, type CitationStyle, type ClaimCheckResult, type ClaimCheckRun, type ClaimMatch, type Figure } from '@/shared/api-types';
import { entryVersionPath } from '@/shared/permalink';
import { CopyButton } from './CopyButton';
import { figureDisplay, HEDGE_WORDS, roleWords } from './figures';

/** The path of an entry's permanent version, for a link inside the app. */
export const versionPath = (m: Pick<ClaimMatch, 'slug' | 'version'>) => entryVersionPath(m.slug, m.version);

/** The paragraph of a variant; a check saved before there were variants has only its one paragraph. */
export function paragraphFor(result: ClaimCheckResult, variant: ParagraphVariant): ClaimParagraph {
  return (result.paragraphs as ClaimCheckResult['paragraphs'] | undefined)?.[variant] ?? result.paragraph;
}

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
      <Notice tone="empty" testID="claim-matches-none" title="No entry matched this text closely.">
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
            Version {m.version}
            {m.words.length > 0 || !m.finding ? ` · match score ${formatScore(m.score)}` : ''}
          </Text>
          {m.finding ? (
            <Text testID={`claim-match-${m.slug}-finding`} style={type.caption}>
              Offered because {m.finding}.
            </Text>
          ) : null}
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

/** How a figure was read beyond its value: the hedge said with it, how it was got, what was assumed. */
export function FigureReadingNotes({ figure, testID }: { figure: Pick<Figure, 'hedge' | 'derived' | 'assumption'>; testID: string }) {
  return (
    <>
      {figure.hedge ? (
        <Text testID={`${testID}-hedge`} style={type.caption}>
          Said as “{HEDGE_WORDS[figure.hedge]}”: the text gives it as a bound, not an exact value.
        </Text>
      ) : null}
      {figure.derived ? (
        <Text testID={`${testID}-derived`} style={type.caption}>
          Worked out from the text: <Text style={styles.value}>{figure.derived}</Text>
        </Text>
      ) : null}
      {figure.assumption ? (
        <Text testID={`${testID}-assumption`} style={type.caption}>
          Read with an assumption you can change: {figure.assumption}
        </Text>
      ) : null}
    </>
  );
}

/** The figures as the result read them, not editable (a shared check). */
export function FigureTable({ figures }: { figures: Figure[] }) {
  if (figures.length === 0) return <Text style={type.body}>No figures with units were found.</Text>;
  return (
    <View role="list" aria-label="Figures found" style={styles.list}>
      {figures.map((f) => (
        <View role="listitem" key={f.id} testID={`claim-figure-${f.id}`} style={styles.row}>
          <Text style={type.uiStrong}>
            {f.id} · {FIGURE_KIND_LABEL[f.kind]}
            {f.upper ? ' · a range' : ''}
          </Text>
          <Text style={type.caption}>
            {f.start === null ? 'Typed by hand' : 'As written'}: <Text style={styles.words}>{f.text}</Text> · read as{' '}
            <Text testID={`claim-figure-${f.id}-value`} style={styles.value}>
              {figureDisplay(f)}
            </Text>{' '}
            · role: {roleWords(f.role)}
          </Text>
          <FigureReadingNotes figure={f} testID={`claim-figure-${f.id}`} />
        </View>
      ))}
    </View>
  );
}

/** The finding in a referee's words: "Breaks conservation of linear momentum". */
export function findingWords(run: Pick<ClaimCheckRun, 'finding' | 'law' | 'verdict' | 'title'>): string {
  const finding = (run.finding as ClaimCheckRun['finding'] | undefined) ?? (run.verdict.holds ? 'consistent' : 'breaks');
  const law = (run.law as string | undefined) || `the condition of ${run.title}`;
  return finding === 'breaks' ? `Breaks ${law}` : `Consistent with ${law}`;
}

/**
 * The run's sentence without the finding it may open with ("Conflicts with conservation of linear
 * momentum: The claimed thrust …"), which the heading above it already says; as it is otherwise.
 */
export function sentenceAfterFinding(run: Pick<ClaimCheckRun, 'sentence' | 'law'>): string {
  const law = ((run.law as string | undefined) ?? '').replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
  const m = new RegExp(`^(?:Consistent with|Conflicts with|In conflict with|Breaks) ${law}\\s*[:;,.—–-]\\s*`, 'i').exec(run.sentence);
  const rest = m ? run.sentence.slice(m[0].length) : run.sentence;
  return rest.length > 0 ? rest.charAt(0).toUpperCase() + rest.slice(1) : run.sentence;
}

/**
 * A neutral mark in graphite beside the words: a plain ring for a claim consistent with the law, a
 * struck ring for one that breaks it. Never a colour code (DESIGN.md §6); the words carry the finding.
 */
function FindingMark({ breaks }: { breaks: boolean }) {
  return (
    <Svg width={22} height={22} aria-hidden>
      <Circle cx={11} cy={11} r={8} fill="none" stroke={colors.ink} strokeWidth={1.6} />
      {breaks ? <Line x1={5.3} y1={16.7} x2={16.7} y2={5.3} stroke={colors.ink} strokeWidth={1.6} /> : null}
    </Svg>
  );
}

/** Each check run: the finding in words, its sentence, the computed figures, what was assumed, and a link to explore it. */
export function CheckRuns({ runs }: { runs: ClaimCheckRun[] }) {
  if (runs.length === 0) {
    return (
      <Notice tone="empty" testID="claim-checks-none" title="No check could be run on these figures.">
        The notes and the list of missing figures say what is needed. Add a figure under Figures found and the checks
        it allows run at once.
      </Notice>
    );
  }
  return (
    <View style={styles.runs}>
      {runs.map((run) => {
        const breaks = ((run.finding as ClaimCheckRun['finding'] | undefined) ?? (run.verdict.holds ? 'consistent' : 'breaks')) === 'breaks';
        return (
          <View key={run.check} testID={`claim-check-${run.check}`} style={styles.run}>
            <Text role="heading" aria-level={3} style={type.heading}>
              {run.title}
            </Text>
            <View
              testID={`claim-check-${run.check}-finding`}
              {...dataAttributes({ finding: breaks ? 'breaks' : 'consistent', holds: String(run.verdict.holds) })}
              style={styles.finding}
            >
              <View style={styles.findingHead}>
                <FindingMark breaks={breaks} />
                <Text testID={`claim-check-${run.check}-finding-words`} style={styles.findingWords}>
                  {findingWords(run)}
                </Text>
              </View>
              <Text testID={`claim-check-${run.check}-sentence`} style={type.body}>
                {run.sentence ? sentenceAfterFinding(run) : printText(run.verdict.message)}
              </Text>
              <Text style={styles.condition}>Condition: {kit[run.check]?.condition ?? run.title}.</Text>
            </View>
            <Text style={type.body}>{run.why}</Text>
            <Text style={type.caption}>Figures used: {run.uses.length ? run.uses.join(', ') : 'none from the text'}</Text>
            <ResultList label={`Computed figures of ${run.title}`}>
              {run.outputs.map((o) => (
                <ResultRow
                  key={o.name}
                  testID={`claim-check-${run.check}-output-${o.name}`}
                  label={o.label}
                  value={{ si: o.si, display: printText(o.display) }}
                />
              ))}
            </ResultList>
            {run.assumptions.length > 0 ? (
              <View testID={`claim-check-${run.check}-assumptions`} style={styles.assumptions}>
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
        );
      })}
    </View>
  );
}

/** The heading of the checks that could not be run: the same words as each item. */
export const NEEDS_TITLE = 'Needs a figure the text does not give';

/** Checks the figures point to but the text cannot run: what is missing, plainly; never a result. */
export function NeedsList({ needs, editable }: { needs: ClaimCheckNeed[]; editable: boolean }) {
  return (
    <View role="list" aria-label={NEEDS_TITLE} testID="claim-needs" style={styles.list}>
      {needs.map((need) => (
        <View role="listitem" key={need.check} testID={`claim-need-${need.check}`} style={styles.row}>
          <Text style={type.uiStrong}>{need.title}</Text>
          <Text testID={`claim-need-${need.check}-missing`} style={type.body}>
            {NEEDS_TITLE}: {need.missing.join('; ')}.
          </Text>
          <Text style={type.caption}>{need.why}</Text>
        </View>
      ))}
      <Text style={[type.caption, styles.afterList]}>
        {editable
          ? 'Not run, so no finding. Add the missing figure under Figures found and the check runs at once; or ask the claimant for it.'
          : 'Not run, so no finding. These are figures to ask the claimant for.'}
      </Text>
    </View>
  );
}

interface ParagraphPanelProps {
  result: ClaimCheckResult;
  variant: ParagraphVariant;
  onVariant: (variant: ParagraphVariant) => void;
  /** The style chosen; with `onStyle`, choosing another runs the check again. */
  style?: CitationStyle;
  onStyle?: (style: CitationStyle) => void;
  /** A re-run for another style is on its way. */
  restyling?: boolean;
}

/**
 * The paste-ready paragraph with its numbered references: whom it is written for (switched at once,
 * all four are in the result), the reference style, and one button that copies paragraph and references.
 */
export function ParagraphPanel({ result, variant, onVariant, style, onStyle, restyling = false }: ParagraphPanelProps) {
  const paragraph = paragraphFor(result, variant);
  const hasVariants = Boolean((result.paragraphs as ClaimCheckResult['paragraphs'] | undefined)?.[variant]);
  return (
    <View style={styles.paragraphBox}>
      {hasVariants ? (
        <>
          <Text testID="claim-variant-label" style={type.ui}>Written as</Text>
          <ChoiceChips
            label="Whom the paragraph is written for"
            testID="claim-variant"
            options={PARAGRAPH_VARIANTS.map((value) => ({ value, label: PARAGRAPH_VARIANT_LABEL[value] }))}
            value={variant}
            onChange={onVariant}
          />
        </>
      ) : null}
      {onStyle && style ? (
        <>
          <Text testID="claim-style-label" style={type.ui}>References in</Text>
          <ChoiceChips
            label="Reference style"
            testID="claim-style"
            options={CITATION_STYLES.map((value) => ({ value, label: CITATION_STYLE_LABEL[value] }))}
            value={style}
            onChange={onStyle}
          />
          {restyling ? (
            <Text testID="claim-style-pending" style={type.caption}>
              Setting the references in {CITATION_STYLE_LABEL[style]}; the paragraph below is in {CITATION_STYLE_LABEL[paragraph.style]} until
              they arrive…
            </Text>
          ) : null}
        </>
      ) : (
        <Text style={type.caption}>References in {CITATION_STYLE_LABEL[paragraph.style]}.</Text>
      )}
      <View
        testID="claim-paragraph"
        {...dataAttributes({ variant: paragraph.variant ?? variant, style: paragraph.style })}
        style={styles.paragraph}
      >
        <Text testID="claim-paragraph-body" selectable style={type.body}>
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
  afterList: { marginTop: space.xs },
  matchHead: { flexDirection: 'row', gap: space.xs, alignItems: 'baseline' },
  rank: { ...type.uiStrong, color: colors.inkMuted },
  matchTitle: { ...type.uiStrong, ...focusRing, color: colors.teal, textDecorationLine: 'underline', flexShrink: 1 },
  words: { ...type.mono, fontSize: 13, color: colors.ink },
  value: { ...type.mono, fontSize: 13, color: colors.ink },
  runs: { gap: space.lg },
  run: { gap: space.sm },
  finding: {
    gap: space.xs,
    backgroundColor: colors.surface,
    borderColor: colors.ruleStrong,
    borderWidth: 1,
    borderLeftColor: colors.ink,
    borderLeftWidth: 3,
    borderRadius: radius.sm,
    padding: space.md,
  },
  findingHead: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xs },
  findingWords: { ...type.uiStrong, flexShrink: 1 },
  condition: { ...type.caption },
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
