import { Text } from 'react-native';
import { RoleGate } from '../account/RoleGate';
import { formatWhen } from '../admin/format';
import { ApiError, apiGet } from '../http/client';
import { useQuery } from '@tanstack/react-query';
import { deskKeys, useDraft } from '../queries/drafts';
import type { DraftDto, DraftPublishedExtra, DraftResponse } from '@/shared/api-types';
import { type } from '../theme';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';
import { Screen, Section } from '../ui/Screen';
import { TextLink } from '../ui/TextLink';
import { SITE_NAME, usePageTitle } from '../ui/usePageTitle';
import { useViewer } from '../viewer';
import { EntryEditor } from './EntryEditor';
import { EntryPreview } from './EntryPreview';
import { ReviewPanel } from './ReviewPanel';

/** A new entry on the Desk: the editor, with no draft until the first save. */
export function NewEntryScreen() {
  usePageTitle(`New entry — ${SITE_NAME}`);
  return (
    <Screen testID="screen-new-entry" title="New entry" lead="Write every section; the draft saves itself once the required parts are there.">
      <RoleGate section="desk">
        <EntryEditor />
      </RoleGate>
    </Screen>
  );
}

/** One draft on the Desk: its author edits it; another editor reviews it once it is sent. */
export function DraftScreen({ id }: { id: number }) {
  // The title follows the draft once the loader (inside the role gate) has fetched it; this only reads the cache.
  const { data } = useQuery({ queryKey: deskKeys.draft(id), queryFn: () => apiGet<DraftResponse>(`/api/drafts/${id}`), enabled: false });
  usePageTitle(data?.draft.content.title ? `Draft: ${data.draft.content.title} — ${SITE_NAME}` : `Draft — ${SITE_NAME}`);
  return (
    <Screen testID="screen-draft" title="Draft">
      <RoleGate section="desk">
        <DraftLoader id={id} />
      </RoleGate>
      <TextLink href="/desk" testID="draft-back">
        Back to the Desk
      </TextLink>
    </Screen>
  );
}

function DraftLoader({ id }: { id: number }) {
  const { data, error, isPending, refetch } = useDraft(id);
  if (isPending) return <Loading testID="draft-loading" label="Loading the draft…" />;
  if (error) {
    const published = publishedAs(error);
    if (published) {
      return (
        <Notice testID="draft-published" title="This draft has been published.">
          {`It became version ${published.version} of “${published.title}”; drafts close when they are published. `}
          <TextLink inline href={`/entries/${published.slug}/v/${published.version}`} testID="draft-published-link">
            {`Read version ${published.version}`}
          </TextLink>
          {'. To change the entry again, open it and start a new revision.'}
        </Notice>
      );
    }
    if (error instanceof ApiError && error.status === 404) {
      return (
        <Notice tone="error" testID="draft-not-found" title="There is no such draft.">
          It may have been published or removed since the link was made. The Desk lists the drafts that are open.
        </Notice>
      );
    }
    return <ErrorNotice testID="draft-error" error={error} what="the draft" onRetry={() => void refetch()} />;
  }
  return <DraftView draft={data.draft} />;
}

/** The version a draft became, from the 404 `draft_published` its old address answers. */
function publishedAs(error: unknown): DraftPublishedExtra['published'] | undefined {
  if (!(error instanceof ApiError) || error.code !== 'draft_published') return undefined;
  const payload = error.payload as Partial<DraftPublishedExtra> | undefined;
  return payload?.published;
}

function DraftView({ draft }: { draft: DraftDto }) {
  const { user } = useViewer();
  const mine = user?.id === draft.author.id;
  const preview = (
    <Section title="The draft as readers will see it">
      <EntryPreview content={draft.content} />
    </Section>
  );

  if (draft.state === 'draft' && mine) return <EntryEditor key={draft.id} draft={draft} />;
  if (draft.state === 'in_review' && !mine) {
    return (
      <>
        <ReviewPanel draft={draft} />
        {preview}
      </>
    );
  }
  return (
    <>
      <Notice testID="draft-read-only" title={draft.state === 'in_review' ? 'Waiting for review' : `${draft.author.displayName}'s draft`}>
        {draft.state === 'in_review'
          ? 'You sent this draft for review; another editor approves it or sends it back.'
          : 'Only its author edits a draft. Once it is sent for review you can approve it or send it back.'}
      </Notice>
      <Text style={type.caption}>Last changed {formatWhen(draft.updatedAt)}.</Text>
      {preview}
    </>
  );
}
