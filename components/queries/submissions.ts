/**
 * The submitters' requests (contract: shared/api/submissions.ts; /api/sightings, /api/corrections,
 * /api/submissions/*): sending a sighting (multipart, with attachments) or a correction, reading
 * one's own submissions, answering a moderator's question; the public "seen in the wild" list of an
 * entry; and the editors' accepted corrections on the Desk.
 */
import { useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type {
  CorrectionBody,
  EntrySightingsResponse,
  SubmissionDto,
  SubmissionListResponse,
  SubmissionResponse,
} from '@/shared/api-types';
import { apiGet, apiSend } from '../http/client';
import { USER_SCOPE, userKey } from './client';
import { staleTimes } from './staleTimes';

export const submissionKeys = {
  /** Everything about submissions that the signed-in account sees, the queue's lists included: dropped together after a change. */
  all: userKey('submissions'),
  /** Keyed by who is signed in too, so that another account never sees the last one's list. */
  mine: (userId: number) => userKey('submissions', 'mine', userId),
  one: (id: number) => userKey('submissions', 'one', id),
  queue: (userId: number) => userKey('submissions', 'queue', userId),
  editors: (isAdmin: boolean) => userKey('submissions', 'editors', isAdmin),
  deskCorrections: userKey('submissions', 'desk-corrections'),
  /** Public: the accepted sightings of an entry. */
  entrySightings: (slug: string) => ['entry-sightings', slug] as const,
};

/** Puts a changed submission in the cache and has every list that may show it fetched again. */
export async function submissionChanged(client: QueryClient, submission: SubmissionDto) {
  client.setQueryData<SubmissionResponse>(submissionKeys.one(submission.id), { submission });
  await Promise.all([
    client.invalidateQueries({ queryKey: submissionKeys.all, predicate: (q) => q.queryKey[0] === USER_SCOPE && q.queryKey[2] !== 'one' }),
    client.invalidateQueries({ queryKey: ['entry-sightings'] }),
  ]);
}

/** A picked file as the sighting form holds it: on the web a File, on a phone a URI. */
export interface PickedFile {
  key: string;
  name: string;
  size: number;
  mediaType: string | undefined;
  file?: Blob;
  uri?: string;
}

export interface SightingInput {
  title: string;
  seenAtUrl: string;
  seenAtCitation: string;
  summary: string;
  figures: { kind: string; quantity: string; label?: string }[];
  files: PickedFile[];
}

/** The multipart body of POST /api/sightings: text fields, figures as JSON text, files as "files". */
export function sightingForm(input: SightingInput): FormData {
  const form = new FormData();
  form.append('title', input.title.trim());
  if (input.seenAtUrl.trim()) form.append('seenAtUrl', input.seenAtUrl.trim());
  if (input.seenAtCitation.trim()) form.append('seenAtCitation', input.seenAtCitation.trim());
  form.append('summary', input.summary.trim());
  form.append('figures', JSON.stringify(input.figures));
  for (const f of input.files) {
    if (f.file) form.append('files', f.file, f.name);
    // React Native's FormData takes a { uri, name, type } object for a file on the device.
    else if (f.uri) form.append('files', { uri: f.uri, name: f.name, type: f.mediaType ?? 'application/octet-stream' } as unknown as Blob);
  }
  return form;
}

/** `POST /api/sightings` (signed in, e-mail confirmed): multipart (the client sends a FormData body as it is), up to 5 files of 10 MB. */
export function useSubmitSighting() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: SightingInput) => apiSend<SubmissionResponse>('POST', '/api/sightings', sightingForm(input)),
    onSuccess: ({ submission }) => submissionChanged(client, submission),
  });
}

/** `POST /api/corrections` (signed in): a reported error against one entry version. */
export function useSubmitCorrection() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: CorrectionBody) => apiSend<SubmissionResponse>('POST', '/api/corrections', body),
    onSuccess: ({ submission }) => submissionChanged(client, submission),
  });
}

/** `GET /api/submissions/mine`: own submissions, newest first, every status. */
export function useMySubmissions(userId: number) {
  return useQuery({
    queryKey: submissionKeys.mine(userId),
    queryFn: ({ signal }) => apiGet<SubmissionListResponse>('/api/submissions/mine', { signal }),
  });
}

/** `GET /api/submissions/:id`: for its submitter, moderators and admins. */
export function useSubmission(id: number) {
  return useQuery({
    queryKey: submissionKeys.one(id),
    queryFn: ({ signal }) => apiGet<SubmissionResponse>(`/api/submissions/${id}`, { signal }),
  });
}

/** `POST /api/submissions/:id/answer` (the submitter, while it is waiting): back to the queue. */
export function useAnswerSubmission(id: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (message: string) => apiSend<SubmissionResponse>('POST', `/api/submissions/${id}/answer`, { message }),
    onSuccess: ({ submission }) => submissionChanged(client, submission),
  });
}

/** `GET /api/entries/:slug/sightings` (public): accepted sightings linked to the entry, newest first. */
export function useEntrySightings(slug: string) {
  return useQuery({
    queryKey: submissionKeys.entrySightings(slug),
    queryFn: ({ signal }) => apiGet<EntrySightingsResponse>(`/api/entries/${encodeURIComponent(slug)}/sightings`, { signal }),
    staleTime: staleTimes.entrySightings,
  });
}

/** `GET /api/desk/corrections` (editors): accepted corrections of entries they wrote or reviewed. */
export function useDeskCorrections() {
  return useQuery({
    queryKey: submissionKeys.deskCorrections,
    queryFn: ({ signal }) => apiGet<SubmissionListResponse>('/api/desk/corrections', { signal }),
  });
}
