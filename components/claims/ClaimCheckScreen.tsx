/**
 * The claim check (DESIGN.md §5): paste a claim, and the server answers with a paste-ready paragraph
 * (four variants, numbered references), the entries the claim matches, the figures found in it, the
 * standard checks run on them and the checks that need a figure the text does not give. Ctrl+Enter
 * (Cmd+Enter) runs it; a figure the reader fixes runs the checks again by itself; a reader who is
 * not signed in can press Save, sign in, and come back to the same check to save it.
 */
import { router } from 'expo-router';
import { useCallback, useEffect, useId, useMemo, useRef, useState } from 'react';
import { StyleSheet, Text, TextInput, View, type NativeSyntheticEvent, type TextInputKeyPressEventData } from 'react-native';
import { CLAIM_TEXT_MAX, type ParagraphVariant } from '@/shared/claims/types';
import { serverFieldErrors } from '../http/fieldErrors';
import { useSession } from '../queries/accounts';
import { type CitationStyle, type ClaimCheckRequest, type ClaimCheckResult } from '@/shared/api-types';
import { useRunClaimCheck, useSavedClaimCheck } from '../queries/claimChecks';
import { colors, space, type } from '../theme';
import { Button } from '../ui/Button';
import { ErrorNotice } from '../ui/ErrorNotice';
import { inputBox } from '../ui/inputBox';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { Screen, Section } from '../ui/Screen';
import { useDebounced } from '../ui/useDebounced';
import { FieldError } from '../worksheet/QuantityField';
import { FigureEditor, type FigureServerErrors } from './FigureEditor';
import { allReadable, draftsOf, figuresKey, toInputs, type FigureDraft } from './figures';
import { CheckRuns, ClaimNotes, MatchList, NEEDS_TITLE, NeedsList, ParagraphPanel } from './ResultParts';
import { forgetKept, keepForSignIn, readKept, RESUME_PATH } from './resume';
import { isNotFound, SavedList, SavePanel, SignInToSave } from './Saving';
import { WhereInText } from './WhereInText';
import { adopt, ClaimCaution, count, status, type Shown } from './ClaimCheckParts';


/** How long the figures must stay unchanged before the checks run again on them. */
export const RERUN_DELAY_MS = 600;

interface ClaimCheckScreenProps {
  /** A saved check to open and re-run ("Open in the claim check"). */
  from?: string;
  /** Back from signing in to save: the check kept in this tab comes back. */
  resume?: boolean;
}

export function ClaimCheckScreen({ from, resume = false }: ClaimCheckScreenProps) {
  const [text, setText] = useState('');
  const [style, setStyle] = useState<CitationStyle>('apa');
  const [variant, setVariant] = useState<ParagraphVariant>('referee');
  const [drafts, setDrafts] = useState<FigureDraft[]>([]);
  const [shown, setShown] = useState<Shown | null>(null);
  /** The drafts a re-run sent, to put the server's objection to figure i beside that figure. */
  const [sent, setSent] = useState<FigureDraft[] | null>(null);
  const [resumed, setResumed] = useState<'yes' | 'missing' | null>(null);
  /** What the request on its way is: the text read afresh, or the checks run again on a result's text. */
  const [runKind, setRunKind] = useState<'check' | 'rerun'>('check');
  const run = useRunClaimCheck();
  const session = useSession();
  const signedIn = Boolean(session.data?.user);
  const textId = useId();
  /** Only the answer to the latest request is shown. */
  const latest = useRef(0);
  /** The figures of the last re-run sent, so that the same figures are not sent twice. */
  const lastSentKey = useRef<string | null>(null);
  const draftsRef = useRef(drafts);
  draftsRef.current = drafts;

  const send = useCallback(
    (request: ClaimCheckRequest, sentDrafts: FigureDraft[] | null, kind: 'check' | 'rerun' = 'rerun') => {
      const mine = ++latest.current;
      setRunKind(kind);
      setSent(sentDrafts);
      lastSentKey.current = sentDrafts ? figuresKey(sentDrafts) : null;
      run.mutate(request, {
        onSuccess: (result) => {
          if (mine !== latest.current) return;
          setShown({ result, request });
          setDrafts(adopt(draftsRef.current, sentDrafts, result));
          setSent(null);
        },
      });
    },
    // run.mutate is stable; run itself is a new object each render.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [run.mutate],
  );

  // Opened from a saved check ("Open in the claim check"): its text, style, figures and result.
  const opened = useSavedClaimCheck(from ?? '', { enabled: Boolean(from) });
  const prefilled = useRef(false);
  useEffect(() => {
    const saved = opened.data?.saved;
    if (!saved || prefilled.current) return;
    prefilled.current = true;
    setText(saved.text);
    setStyle(saved.style);
    setVariant((saved.result.variant as ParagraphVariant | undefined) ?? 'referee');
    setShown({ result: saved.result, request: { text: saved.text, style: saved.style, ...(saved.figures ? { figures: saved.figures } : {}) } });
    setDrafts(draftsOf(saved.result.figures));
  }, [opened.data]);

  // Back from signing in to save: the check kept before leaving.
  useEffect(() => {
    if (!resume) return;
    const kept = readKept();
    if (!kept) {
      setResumed('missing');
      return;
    }
    setText(kept.text);
    setStyle(kept.style);
    setVariant(kept.variant);
    setDrafts(kept.drafts);
    if (kept.result) setShown({ result: kept.result, request: kept.request });
    else send(kept.request, null, 'check');
    setResumed('yes');
    // Once, on arrival.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [resume]);

  const tooLong = text.length > CLAIM_TEXT_MAX;
  const empty = text.trim() === '';
  const pendingRequest = run.isPending ? run.variables : undefined;
  const checking = pendingRequest !== undefined && (runKind === 'check' || shown === null);
  const rerunning = pendingRequest !== undefined && !checking;

  const check = () => {
    if (tooLong || empty || checking) return;
    send({ text, style, variant }, null, 'check');
  };
  const onKeyPress = (event: NativeSyntheticEvent<TextInputKeyPressEventData>) => {
    const key = event.nativeEvent as TextInputKeyPressEventData & { ctrlKey?: boolean; metaKey?: boolean };
    if (key.key === 'Enter' && (key.ctrlKey || key.metaKey)) {
      event.preventDefault();
      check();
    }
  };

  // The figures as fixed: readable ones run the checks again once the reader stops typing.
  const key = figuresKey(drafts);
  const settledKey = useDebounced(key, RERUN_DELAY_MS);
  const readable = useMemo(() => allReadable(drafts), [drafts]);
  const resultKey = useMemo(() => (shown ? figuresKey(draftsOf(shown.result.figures)) : null), [shown]);
  const edited = shown !== null && key !== resultKey;
  useEffect(() => {
    // Not while the text is being read afresh: its answer brings figures of its own.
    if (!shown || checking || !edited || !readable || settledKey !== key || key === lastSentKey.current) return;
    send({ text: shown.request.text, style, variant, figures: toInputs(drafts) }, drafts);
  }, [settledKey, key, checking, edited, readable, shown, style, variant, drafts, send]);

  /** Another reference style: the check runs again (the figures as they stand). */
  const onStyle = (next: CitationStyle) => {
    setStyle(next);
    if (!shown) return;
    const base = { text: shown.request.text, style: next, variant };
    if (readable && (edited || shown.request.figures)) send({ ...base, figures: toInputs(drafts) }, drafts);
    else send(shown.request.figures ? { ...base, figures: shown.request.figures } : base, null);
  };

  // What Save stores: the request of the result on screen, with the paragraph variant chosen.
  const saveRequest = useMemo<ClaimCheckRequest | null>(() => (shown ? { ...shown.request, variant } : null), [shown, variant]);
  const signInToSave = () => {
    if (!shown || !saveRequest) return false;
    const kept = keepForSignIn({ text, style, variant, drafts, request: saveRequest, result: shown.result });
    if (kept) router.push(`/sign-in?next=${encodeURIComponent(RESUME_PATH)}`);
    return kept;
  };

  const error = run.error;
  const fields = serverFieldErrors(error);
  const textError = fields['body.text'];
  const figureErrors: Record<string, FigureServerErrors> = {};
  for (const [field, message] of Object.entries(fields)) {
    const m = /^body\.figures\.(\d+)(?:\.(\w+))?/.exec(field);
    const draft = m && sent ? sent[Number(m[1])] : undefined;
    if (!draft) continue;
    // Only while the figure is as it was sent: once retyped, the live reading speaks for it.
    const now = drafts.find((d) => d.key === draft.key);
    if (!now || figuresKey([now]) !== figuresKey([draft])) continue;
    const slot = m?.[2] === 'upper' ? 'upper' : 'quantity';
    figureErrors[draft.key] = { ...figureErrors[draft.key], [slot]: message };
  }
  const restyling = rerunning && shown !== null && pendingRequest?.style !== shown.result.style;

  return (
    <Screen
      testID="screen-check"
      title="Claim check"
      lead="Paste a claim — an abstract, a press release, a pitch. The check writes a paragraph you can paste into your report, finds the library entries the claim matches, reads its figures and runs the standard checks they allow."
    >
      <ClaimCaution />

      {from && opened.isPending ? <Loading testID="claim-opening" label="Opening the saved check…" /> : null}
      {from && opened.error ? (
        isNotFound(opened.error) ? (
          <Notice tone="error" testID="claim-opening-not-found" title="That saved check is gone.">
            {opened.error.message} Paste the claim below to check it again.
          </Notice>
        ) : (
          <ErrorNotice testID="claim-opening-error" error={opened.error} what="the saved check" onRetry={() => void opened.refetch()} />
        )
      ) : null}
      {resumed === 'missing' ? (
        <Notice testID="claim-resume-missing" title="The check you were saving is not here.">
          It is kept only in the browser tab where you pressed Save, until that tab is closed. Paste the claim below and
          run it again; signed in, you can then save it at once.
        </Notice>
      ) : null}

      <View testID="claim-form" style={styles.form}>
        <Text nativeID={`${textId}-label`} style={type.uiStrong}>
          The claim’s text
        </Text>
        <TextInput
          testID="claim-text"
          aria-label="The claim’s text"
          aria-describedby={`${textId}-hint ${textId}-count${textError ? ` ${textId}-error` : ''}`}
          aria-invalid={tooLong || textError ? true : undefined}
          multiline
          numberOfLines={10}
          value={text}
          onChangeText={setText}
          onKeyPress={onKeyPress}
          placeholder="Paste the abstract, press release or pitch here, figures and all."
          placeholderTextColor={colors.inkMuted}
          style={[styles.textarea, tooLong || textError ? inputBox.error : null]}
        />
        <Text nativeID={`${textId}-hint`} testID="claim-text-hint" style={type.small}>
          Ctrl+Enter (⌘+Enter on a Mac) runs the check from the text box.
        </Text>
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
        {shown && !empty && text !== shown.request.text ? (
          <Text testID="claim-text-changed" style={type.caption}>
            The text has changed since the check ran; the result below is for the text before the change. Check this claim
            again to read the new text.
          </Text>
        ) : null}
        <Button
          testID="claim-run"
          label="Check this claim"
          busy={checking}
          busyLabel="Checking…"
          disabled={tooLong || empty || checking}
          onPress={check}
        />
        <Text testID="claim-status" role="status" style={type.caption}>
          {status({ checking, rerunning, restyling, pendingRequest, shown, edited, readable, style })}
        </Text>
      </View>

      {error ? (
        <ErrorNotice
          testID="claim-error"
          error={error}
          what="the claim check"
          onRetry={() => {
            if (!run.variables) return;
            lastSentKey.current = null;
            send(run.variables, sent, runKind);
          }}
        />
      ) : null}

      {shown ? (
        <View testID="claim-result" aria-busy={run.isPending || undefined} style={run.isPending ? styles.stale : undefined}>
          <Section title="Paragraph to paste">
            <ParagraphPanel
              result={shown.result}
              variant={variant}
              onVariant={setVariant}
              style={style}
              onStyle={onStyle}
              restyling={restyling}
            />
          </Section>
          <View style={styles.notes}>
            <ClaimNotes notes={shown.result.notes} />
          </View>
          <Section title="Matching entries">
            <MatchList matches={shown.result.matches} />
          </Section>
          <Section title="Figures found">
            <Text testID="claim-figures-intro" style={[type.caption, styles.intro]}>
              Each figure as the text gives it and in SI. Retype a value, give the upper end of a range, change its kind or
              role, remove it or add one: the checks run again as soon as you stop typing.
            </Text>
            <FigureEditor drafts={drafts} onChange={setDrafts} figures={shown.result.figures} errors={figureErrors} />
            <WhereInText text={shown.request.text} figures={drafts} />
          </Section>
          <Section title="Checks run">
            <CheckRuns runs={shown.result.checks} />
          </Section>
          {(shown.result.needs as ClaimCheckResult['needs'] | undefined)?.length ? (
            <Section title={NEEDS_TITLE}>
              <NeedsList needs={shown.result.needs} editable />
            </Section>
          ) : null}
          <Section title="Save and share">
            {saveRequest ? (
              <SavePanel
                request={saveRequest}
                unsavedEdits={edited}
                signedIn={signedIn}
                onSignInToSave={signInToSave}
                onSaved={() => {
                  forgetKept();
                  setResumed(null);
                }}
                resumed={resumed === 'yes'}
              />
            ) : null}
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
  notes: { marginTop: space.lg },
  stale: { opacity: 0.7 },
});
