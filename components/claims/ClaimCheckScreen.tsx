/**
 * The claim check (DESIGN.md §5): paste a claim, and the server answers with the entries it matches,
 * the figures found in it, the standard checks run on them, and a referee paragraph with numbered
 * references. The reader fixes the figures and re-runs; signed in, saves the check and shares it.
 */
import { useEffect, useId, useRef, useState } from 'react';
import { StyleSheet, Text, TextInput, View } from 'react-native';
import { CLAIM_TEXT_MAX } from '@/shared/claims/types';
import { ChoiceChips } from '../admin/ChoiceChips';
import { ApiError, useSession } from '../api';
import { colors, space, type } from '../theme';
import { Button } from '../ui/Button';
import { ErrorNotice } from '../ui/ErrorNotice';
import { inputBox } from '../ui/inputBox';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { Screen, Section } from '../ui/Screen';
import { FieldError } from '../worksheet/QuantityField';
import {
  CLAIM_STYLE_LABEL,
  CLAIM_STYLES,
  useRunClaimCheck,
  useSavedClaimCheck,
  type ClaimCheckRequest,
  type ClaimCheckResult,
  type ClaimStyle,
} from './api';
import { FigureEditor } from './FigureEditor';
import { changedFrom, draftsOf, toInputs, type FigureDraft } from './figures';
import { CheckRuns, ClaimNotes, MatchList, ParagraphPanel } from './ResultParts';
import { isNotFound, SavedList, SavePanel, SignInToSave } from './Saving';
import { WhereInText } from './WhereInText';

interface Shown {
  result: ClaimCheckResult;
  /** The request that produced it: what a save stores and what a re-run starts from. */
  request: ClaimCheckRequest;
}

const count = (n: number) => n.toLocaleString('en-US');

/** The caution every claim check carries. */
export function ClaimCaution() {
  return (
    <Notice testID="claim-caution" title="What this judges">
      The checks judge the claim’s figures and mechanism, not the people making it. Where hardware is involved — high
      voltage, RF, vacuum, rotating machinery — local codes and licensed practice come first.
    </Notice>
  );
}

export function ClaimCheckScreen({ from }: { from?: string }) {
  const [text, setText] = useState('');
  const [style, setStyle] = useState<ClaimStyle>('apa');
  const [drafts, setDrafts] = useState<FigureDraft[]>([]);
  const [shown, setShown] = useState<Shown | null>(null);
  /** The drafts a re-run sent, to put the server's objection to figure i beside that figure. */
  const [sent, setSent] = useState<FigureDraft[] | null>(null);
  const run = useRunClaimCheck();
  const session = useSession();
  const signedIn = Boolean(session.data?.user);
  const textId = useId();

  // Opened from a saved check ("Open in the claim check"): its text, style, figures and result.
  const opened = useSavedClaimCheck(from ?? '', { enabled: Boolean(from) });
  const prefilled = useRef(false);
  useEffect(() => {
    const saved = opened.data?.saved;
    if (!saved || prefilled.current) return;
    prefilled.current = true;
    setText(saved.text);
    setStyle(saved.style);
    setShown({ result: saved.result, request: { text: saved.text, style: saved.style, ...(saved.figures ? { figures: saved.figures } : {}) } });
    setDrafts(draftsOf(saved.result.figures));
  }, [opened.data]);

  const tooLong = text.length > CLAIM_TEXT_MAX;
  const empty = text.trim() === '';
  const rerunning = run.isPending && run.variables?.figures !== undefined;

  const send = (request: ClaimCheckRequest, sentDrafts: FigureDraft[] | null) => {
    setSent(sentDrafts);
    run.mutate(request, {
      onSuccess: (result) => {
        setShown({ result, request });
        setDrafts(draftsOf(result.figures));
        setSent(null);
      },
    });
  };
  const check = () => {
    if (tooLong || empty || run.isPending) return;
    send({ text, style }, null);
  };
  const rerun = () => {
    if (!shown || run.isPending) return;
    send({ text: shown.request.text, style, figures: toInputs(drafts) }, drafts);
  };

  const error = run.error;
  const fields = error instanceof ApiError ? (error.fields ?? {}) : {};
  const textError = fields['body.text'];
  const figureErrors: Record<string, string> = {};
  for (const [key, message] of Object.entries(fields)) {
    const m = /^body\.figures\.(\d+)(?:\.|$)/.exec(key);
    const draft = m && sent ? sent[Number(m[1])] : undefined;
    if (draft) figureErrors[draft.id] = message;
  }
  const edited = shown ? changedFrom(drafts, shown.result.figures) : false;

  return (
    <Screen
      testID="screen-check"
      title="Claim check"
      lead="Paste a claim — an abstract, a press release, a pitch. The check finds the library entries it matches, reads the figures in it, runs the standard checks they allow, and writes a referee paragraph with numbered references."
    >
      <ClaimCaution />

      {from && opened.isPending ? <Loading testID="claim-opening" label="Opening the saved check…" /> : null}
      {from && opened.error ? (
        isNotFound(opened.error) ? (
          <Notice testID="claim-opening-not-found" title="That saved check is gone.">
            {opened.error.message} Paste the claim below to check it again.
          </Notice>
        ) : (
          <ErrorNotice testID="claim-opening-error" error={opened.error} what="the saved check" onRetry={() => void opened.refetch()} />
        )
      ) : null}

      <View style={styles.form}>
        <Text nativeID={`${textId}-label`} style={type.uiStrong}>
          The claim’s text
        </Text>
        <TextInput
          testID="claim-text"
          aria-label="The claim’s text"
          aria-describedby={`${textId}-count${textError ? ` ${textId}-error` : ''}`}
          aria-invalid={tooLong || textError ? true : undefined}
          multiline
          numberOfLines={10}
          value={text}
          onChangeText={setText}
          placeholder="Paste the abstract, press release or pitch here, figures and all."
          placeholderTextColor={colors.inkMuted}
          style={[styles.textarea, tooLong || textError ? inputBox.error : null]}
        />
        <Text nativeID={`${textId}-count`} testID="claim-text-count" style={type.small}>
          {count(text.length)} of {count(CLAIM_TEXT_MAX)} characters
        </Text>
        {tooLong ? (
          <FieldError
            testID="claim-text-too-long"
            message={`The text is ${count(text.length - CLAIM_TEXT_MAX)} characters over the limit. Keep the part that states the claim and its figures.`}
          />
        ) : null}
        {textError && !tooLong ? <FieldError id={`${textId}-error`} testID="claim-text-error" message={textError} /> : null}

        <Text style={type.uiStrong}>Citation style of the paragraph</Text>
        <ChoiceChips
          label="Citation style of the paragraph"
          testID="claim-style"
          options={CLAIM_STYLES.map((value) => ({ value, label: CLAIM_STYLE_LABEL[value] }))}
          value={style}
          onChange={setStyle}
        />
        <Button
          testID="claim-run"
          label="Check this claim"
          busy={run.isPending && !rerunning}
          busyLabel="Checking…"
          disabled={tooLong || empty || run.isPending}
          onPress={check}
        />
        <Text testID="claim-status" role="status" style={type.caption}>
          {run.isPending
            ? rerunning
              ? `Re-running with ${run.variables?.figures?.length ?? 0} figures; the result below is the previous one until the new one arrives…`
              : 'Checking the claim…'
            : shown
              ? summary(shown.result)
              : ''}
        </Text>
      </View>

      {error ? (
        <ErrorNotice
          testID="claim-error"
          error={error}
          what="the claim check"
          onRetry={() => run.variables && send(run.variables, sent)}
        />
      ) : null}

      {shown ? (
        <View testID="claim-result" aria-busy={run.isPending || undefined} style={run.isPending ? styles.stale : undefined}>
          <ClaimNotes notes={shown.result.notes} />
          <Section title="Matching entries">
            <MatchList matches={shown.result.matches} />
          </Section>
          <Section title="Figures found">
            <Text style={[type.caption, styles.intro]}>
              Each figure as the text gives it and in SI. Retype a quantity, change its kind or role, remove it or add
              one, then re-run the checks with your figures.
            </Text>
            <FigureEditor drafts={drafts} onChange={setDrafts} figures={shown.result.figures} errors={figureErrors} />
            <View style={styles.rerun}>
              <Button
                testID="claim-rerun"
                label="Re-run with these figures"
                busy={rerunning}
                busyLabel="Re-running…"
                disabled={run.isPending}
                onPress={rerun}
              />
              {edited ? (
                <Text testID="claim-figures-edited" style={type.caption}>
                  The figures were changed; the checks below are for the figures before the change until you re-run.
                </Text>
              ) : null}
            </View>
            <WhereInText text={shown.request.text} figures={drafts} />
          </Section>
          <Section title="Checks run">
            <CheckRuns runs={shown.result.checks} />
          </Section>
          <Section title="Referee paragraph">
            {style !== shown.result.style ? (
              <Text testID="claim-style-pending" style={[type.caption, styles.intro]}>
                This paragraph is in {CLAIM_STYLE_LABEL[shown.result.style]}; re-run to have it in {CLAIM_STYLE_LABEL[style]}.
              </Text>
            ) : null}
            <ParagraphPanel paragraph={shown.result.paragraph} />
          </Section>
          <Section title="Save and share">
            {signedIn ? <SavePanel request={shown.request} unsavedEdits={edited} /> : <SignInToSave />}
          </Section>
        </View>
      ) : null}

      {signedIn ? (
        <Section title="Your saved checks">
          <SavedList />
        </Section>
      ) : shown ? null : (
        <SignInToSave />
      )}
    </Screen>
  );
}

function summary(result: ClaimCheckResult): string {
  const n = (k: number, one: string, many: string) => `${k} ${k === 1 ? one : many}`;
  return `${n(result.matches.length, 'entry', 'entries')} matched, ${n(result.figures.length, 'figure', 'figures')} found, ${n(result.checks.length, 'check', 'checks')} run.`;
}

const styles = StyleSheet.create({
  form: { gap: space.xs },
  textarea: {
    ...type.body,
    ...inputBox.box,
    minHeight: 200,
    paddingVertical: space.sm,
    textAlignVertical: 'top',
  },
  intro: { marginBottom: space.sm },
  rerun: { gap: space.xs, marginTop: space.md },
  stale: { opacity: 0.7 },
});
