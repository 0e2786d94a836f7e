/**
 * The submitters' requests of issue 7 (contract: shared/submissions/types.ts, /api/sightings,
 * /api/corrections, /api/submissions/*): sending a sighting (multipart, with attachments) or a
 * correction, reading one's own submissions, answering a moderator's question; and the public
 * "seen in the wild" list of an entry. JSON goes through the app's one client (components/api.ts);
 * the multipart sighting needs a FormData body, sent by `sendForm` below with the same CSRF header
 * and the same two kinds of error.
 */
import { useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type {
  CorrectionSection,
  EntrySightingDto,
  SubmissionDto,
  SubmissionSummaryDto,
} from '@/shared/submissions/types';
import { apiGet, apiSend } from '../api';

export type {
  AttachmentDto,
  ClaimedFigureDto,
  CorrectionSection,
  Decision,
  EntrySightingDto,
  PersonRef,
  SubmissionDto,
  SubmissionEventDto,
  SubmissionKind,
  SubmissionStatus,
  SubmissionSummaryDto,
} from '@/shared/submissions/types';

export const submissionKeys = {
  /** Everything about submissions, the queue's lists included: dropped together after a change. */
  all: ['submissions'] as const,
  /** Keyed by who is signed in, so that another account never sees the last one's list. */
  mine: (userId: number) => ['submissions', 'mine', userId] as const,
  one: (id: number) => ['submissions', 'one', id] as const,
  queue: (userId: number) => ['submissions', 'queue', userId] as const,
  deskCorrections: ['submissions', 'desk-corrections'] as const,
  entrySightings: (slug: string) => ['submissions', 'entry-sightings', slug] as const,
};

export interface SubmissionResponse {
  submission: SubmissionDto;
}

/** Puts a changed submission in the cache and has every list that may show it fetched again. */
export async function submissionChanged(client: QueryClient, submission: SubmissionDto) {
  client.setQueryData<SubmissionResponse>(submissionKeys.one(submission.id), { submission });
  await client.invalidateQueries({ queryKey: submissionKeys.all, predicate: (q) => q.queryKey[1] !== 'one' });
}


/** POSTs a FormData body (files and fields) with the session's CSRF token, like every other write. */
export function sendForm<T>(path: string, form: FormData): Promise<T> {
  return apiSend<T>('POST', path, form);
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

/** `POST /api/sightings` (signed in, e-mail confirmed): multipart, up to 5 files of 10 MB. */
export function useSubmitSighting() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: SightingInput) => sendForm<SubmissionResponse>('/api/sightings', sightingForm(input)),
    onSuccess: ({ submission }) => submissionChanged(client, submission),
  });
}

export interface CorrectionInput {
  entry: string;
  version: number;
  section: CorrectionSection;
  whatIsWrong: string;
  suggestedFix: string;
  sources?: string;
}

/** `POST /api/corrections` (signed in): a reported error against one entry version. */
export function useSubmitCorrection() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: CorrectionInput) => apiSend<SubmissionResponse>('POST', '/api/corrections', body),
    onSuccess: ({ submission }) => submissionChanged(client, submission),
  });
}

/** `GET /api/submissions/mine`: own submissions, newest first, every status. */
export function useMySubmissions(userId: number) {
  return useQuery({
    queryKey: submissionKeys.mine(userId),
    queryFn: ({ signal }) => apiGet<{ items: SubmissionSummaryDto[] }>('/api/submissions/mine', { signal }),
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
    queryFn: ({ signal }) =>
      apiGet<{ sightings: EntrySightingDto[] }>(`/api/entries/${encodeURIComponent(slug)}/sightings`, { signal }),
    staleTime: 60 * 1000,
  });
}

/** `GET /api/desk/corrections` (editors): accepted corrections of entries they wrote or reviewed. */
export function useDeskCorrections() {
  return useQuery({
    queryKey: submissionKeys.deskCorrections,
    queryFn: ({ signal }) => apiGet<{ items: SubmissionSummaryDto[] }>('/api/desk/corrections', { signal }),
  });
}
