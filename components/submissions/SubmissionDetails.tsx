/**
 * Everything a submission holds, as its submitter and the moderators read it: what was sent (all of
 * it plain text, never read as HTML), its figures, its attachments as downloads (images shown and
 * PDFs opened in place for a preview), the decision and
 * the history of what happened to it.
 */
import { entryVersionPath } from '@/shared/permalink';
import type { ReactNode } from 'react';
import { Image, StyleSheet, Text, View } from 'react-native';
import { FIGURE_KIND_LABEL } from '@/shared/claims/types';
import { readableText } from '@/shared/format/numbers';
import { formatWhen } from '../admin/format';
import { colors, focusRing, radius, space, type } from '../theme';
import { Section } from '../ui/Screen';
import { TextLink } from '../ui/TextLink';
import type { AttachmentDto, SubmissionDto } from '@/shared/api-types';
import { mediaTypeWords as fileTypeWords } from './sighting';
import { bytesWords, eventWords, KIND_WORDS, SECTION_LABEL } from './words';

/** A fact with its label above it; a string value carries the testID itself. */
export function Fact({ label, children, testID }: { label: string; children: ReactNode; testID?: string }) {
  return (
    <View style={styles.fact} testID={typeof children === 'string' ? undefined : testID}>
      <Text style={type.caption}>{label}</Text>
      {typeof children === 'string' ? (
        <Text testID={testID} style={styles.userText}>
          {children}
        </Text>
      ) : (
        children
      )}
    </View>
  );
}

/** A link out of the app: a plain anchor on the web (never routed), opening in a new tab. */
export function OutLink({ href, children, testID, download = false }: { href: string; children: ReactNode; testID?: string; download?: boolean }) {
  const attrs = { href, hrefAttrs: download ? { download: true } : { target: '_blank', rel: 'noopener noreferrer nofollow' } };
  return (
    <Text {...attrs} testID={testID} role="link" style={styles.link}>
      {children}
    </Text>
  );
}

/** The status as a neutral mark with its words: no colour says good or bad. */
export function StatusMark({ words, testID, status }: { words: string; testID: string; status: string }) {
  return (
    <View style={styles.statusRow}>
      <View style={styles.mark} />
      <Text testID={testID} {...{ dataSet: { status } }} style={type.uiStrong}>
        {words}
      </Text>
    </View>
  );
}

export function SubmissionBody({ submission: s }: { submission: SubmissionDto }) {
  return (
    <View style={styles.body}>
      <Fact label="Kind">{KIND_WORDS[s.kind]}</Fact>
      <Fact label="Sent in">
        <Text style={type.ui}>
          {formatWhen(s.createdAt)} by {s.submitter.displayName}
        </Text>
      </Fact>
      {s.kind === 'sighting' ? <SightingBody submission={s} /> : <CorrectionBody submission={s} />}
    </View>
  );
}

function SightingBody({ submission: s }: { submission: SubmissionDto }) {
  return (
    <>
      {s.seenAtUrl ? (
        <Fact label="Seen at">
          <OutLink href={s.seenAtUrl} testID="submission-url">
            {s.seenAtUrl}
          </OutLink>
        </Fact>
      ) : null}
      {s.seenAtCitation ? <Fact label="Citation" testID="submission-citation">{s.seenAtCitation}</Fact> : null}
      {s.summary ? <Fact label="Summary" testID="submission-summary">{s.summary}</Fact> : null}
      <Fact label="Claimed figures">
        {s.figures.length === 0 ? (
          <Text style={type.caption}>None given.</Text>
        ) : (
          <View role="list" style={styles.list} testID="submission-figures">
            {s.figures.map((f, i) => (
              <View role="listitem" key={i} testID={`submission-figure-${i}`} style={styles.row}>
                <Text style={type.uiStrong}>
                  {f.label ? `${f.label} · ` : ''}
                  {FIGURE_KIND_LABEL[f.kind]}
                </Text>
                <Text style={type.mono}>
                  {f.quantity} <Text style={type.caption}>= </Text>
                  <Text {...{ dataSet: { si: String(f.si) } }} testID={`submission-figure-${i}-si`}>
                    {readableText(f.display)}
                  </Text>
                </Text>
              </View>
            ))}
          </View>
        )}
      </Fact>
      <Fact label="Attachments">
        <Attachments items={s.attachments} />
      </Fact>
    </>
  );
}

function Attachments({ items }: { items: AttachmentDto[] }) {
  if (items.length === 0) return <Text style={type.caption}>None.</Text>;
  return (
    <View role="list" style={styles.list} testID="submission-attachments">
      {items.map((a) => (
        <View role="listitem" key={a.id} style={styles.row}>
          <OutLink href={a.url} download testID={`attachment-${a.id}`}>
            {a.name}
          </OutLink>
          <Text style={type.caption}>
            {fileTypeWords(a.mediaType)}, {bytesWords(a.size)} · the name downloads it
          </Text>
          <Preview attachment={a} />
          <Text selectable style={styles.hash}>
            SHA-256 {a.sha256}
          </Text>
        </View>
      ))}
    </View>
  );
}

/** Raster images the browser shows as they are (the server says which type each file is, read from its bytes). */
const IMAGE_TYPES = new Set(['image/png', 'image/jpeg', 'image/webp', 'image/gif']);

/** The address that asks the server for the file to be shown in place. */
export const previewUrl = (a: AttachmentDto) => `${a.url}${a.url.includes('?') ? '&' : '?'}view=inline`;

/**
 * A preview: an image is shown (as an image, never as markup), a PDF opens in a new tab in the
 * browser's viewer; anything else only downloads. Only those allowed to see the submission get its
 * attachments at all, so only they see a preview.
 */
function Preview({ attachment: a }: { attachment: AttachmentDto }) {
  if (IMAGE_TYPES.has(a.mediaType)) {
    return (
      <Image
        testID={`attachment-${a.id}-preview`}
        source={{ uri: previewUrl(a) }}
        accessibilityLabel={`Preview of ${a.name}`}
        resizeMode="contain"
        style={styles.preview}
      />
    );
  }
  if (a.mediaType === 'application/pdf') {
    return (
      <OutLink href={previewUrl(a)} testID={`attachment-${a.id}-open`}>
        Open the PDF in a new tab
      </OutLink>
    );
  }
  return null;
}

function CorrectionBody({ submission: s }: { submission: SubmissionDto }) {
  return (
    <>
      {s.entry ? (
        <Fact label="Entry">
          <TextLink href={entryVersionPath(s.entry.slug, s.entry.version)} testID="submission-entry">
            {s.entry.title}, version {s.entry.version}
          </TextLink>
        </Fact>
      ) : null}
      {s.section ? <Fact label="Section">{SECTION_LABEL[s.section]}</Fact> : null}
      {s.whatIsWrong ? <Fact label="What is wrong" testID="submission-wrong">{s.whatIsWrong}</Fact> : null}
      {s.suggestedFix ? <Fact label="Suggested fix" testID="submission-fix">{s.suggestedFix}</Fact> : null}
      {s.sources ? <Fact label="Sources" testID="submission-sources">{s.sources}</Fact> : null}
    </>
  );
}

const DECISION_WORDS = {
  accept: 'Accepted',
  draft: 'Turned into a draft entry',
  ask: 'More was asked for',
  reject: 'Not taken',
} as const;

/** The decision, its note, and where it led (the entries a sighting is linked to, or the draft). */
export function DecisionPart({ submission: s, audience }: { submission: SubmissionDto; audience: 'submitter' | 'moderator' }) {
  if (!s.decision) return null;
  return (
    <View testID="submission-decision" style={styles.decision}>
      <Text style={type.uiStrong}>
        {DECISION_WORDS[s.decision]}
        {s.decidedBy ? ` by ${s.decidedBy.displayName}` : ''}
        {s.decidedAt ? `, ${formatWhen(s.decidedAt)}` : ''}
      </Text>
      {s.decisionNote ? (
        <Fact label={s.decision === 'ask' ? 'The question' : s.decision === 'reject' ? 'The reason' : 'Note'} testID="submission-decision-note">
          {s.decisionNote}
        </Fact>
      ) : null}
      {s.linkedEntries.length > 0 ? (
        <Fact label={s.kind === 'sighting' ? 'Linked to the entries' : 'Entries'}>
          <View style={styles.links}>
            {s.linkedEntries.map((e) => (
              <TextLink key={e.slug} href={`/entries/${e.slug}`} testID={`submission-linked-${e.slug}`}>
                {e.title}
              </TextLink>
            ))}
          </View>
        </Fact>
      ) : null}
      {s.decision === 'accept' && s.kind === 'correction' ? (
        <Text style={type.caption}>Forwarded to the editors of the entry, who decide how to revise it.</Text>
      ) : null}
      {s.draft ? (
        audience === 'moderator' ? (
          <Text style={type.caption}>A draft entry “{s.draft.slug}” was opened on an editor’s Desk.</Text>
        ) : (
          <Text style={type.caption}>An editor is writing a new entry from it (“{s.draft.slug}”); it appears in the library once reviewed and published.</Text>
        )
      ) : null}
    </View>
  );
}

export function History({ submission: s }: { submission: SubmissionDto }) {
  return (
    <Section title="History">
      <View role="list" testID="submission-history" style={styles.list}>
        {s.events.map((e, i) => (
          <View role="listitem" key={i} testID={`submission-event-${i}`} style={styles.row}>
            <Text style={type.uiStrong}>{eventWords(e.what)}</Text>
            <Text style={type.caption}>
              {formatWhen(e.at)}
              {e.by ? ` · ${e.by.displayName}` : ''}
            </Text>
            {e.note ? <Text style={styles.userText}>{e.note}</Text> : null}
          </View>
        ))}
      </View>
    </Section>
  );
}

const styles = StyleSheet.create({
  body: { gap: space.md },
  fact: { gap: space.xxs },
  userText: { ...type.body },
  link: { ...type.ui, ...focusRing, color: colors.teal, textDecorationLine: 'underline', alignSelf: 'flex-start' },
  statusRow: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  mark: { width: 10, height: 10, borderRadius: radius.pill, borderWidth: 2, borderColor: colors.ink },
  list: { borderTopColor: colors.rule, borderTopWidth: 1 },
  row: { gap: space.xxs, paddingVertical: space.sm, borderBottomColor: colors.rule, borderBottomWidth: 1 },
  hash: { ...type.small, fontFamily: type.mono.fontFamily },
  preview: { width: '100%', maxWidth: 360, aspectRatio: 4 / 3, backgroundColor: colors.surface, borderColor: colors.rule, borderWidth: 1, borderRadius: radius.sm },
  decision: {
    gap: space.xs,
    padding: space.md,
    borderRadius: radius.sm,
    borderLeftWidth: 3,
    borderLeftColor: colors.teal,
    backgroundColor: colors.surface,
  },
  links: { gap: space.xs },
});
