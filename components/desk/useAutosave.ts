import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, useState } from 'react';
import type { EntryContent } from '@/shared/entries/schema';
import { createDraft, deskKeys, draftOfConflict, saveDraft } from '../queries/drafts';
import type { DraftDto } from '@/shared/api-types';
import { problemOf, type FormProblem } from '../auth/useForm';

/** Where the draft stands against the server. */
export type SaveState =
  | { kind: 'unsaved' }
  | { kind: 'incomplete' }
  | { kind: 'saving' }
  | { kind: 'saved'; at: Date }
  | { kind: 'failed'; problem: FormProblem }
  /** Someone saved this draft since it was opened here: their version, until the editor chooses. */
  | { kind: 'conflict'; theirs: DraftDto };

interface AutosaveOptions {
  /** The draft being edited; undefined for a new entry, created on its first save. */
  draft?: { id: number; lockVersion: number; content: EntryContent; updatedAt?: string };
  slug: string;
  /** The content to save, or undefined while it does not pass the schema. */
  content?: EntryContent;
  delayMs?: number;
  /** After the first save of a new entry has made its draft (the editor moves to the draft's own address). */
  onCreated?: (draft: DraftDto) => void;
}

const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/**
 * Saves the draft as the editor types: a while after the last change, if the content passes the
 * schema and differs from what was last saved. Each save carries the lock version it started
 * from; a 409 `edit_conflict` stops saving and keeps the other version for the editor to choose
 * from (`keepMine` saves over it knowingly, `takeTheirs` drops the local changes). Never a silent overwrite.
 */
export function useAutosave({ draft, slug, content, delayMs = 800, onCreated }: AutosaveOptions) {
  const created = useRef(onCreated);
  created.current = onCreated;
  const client = useQueryClient();
  const [state, setState] = useState<SaveState>({ kind: 'unsaved' });
  const [saved, setSaved] = useState(draft);
  const inFlight = useRef(false);
  /** When what is on the server was saved: the draft's own time when opened, then each save's. */
  const savedAt = useRef(draft?.updatedAt ? new Date(draft.updatedAt) : new Date());

  const write = useCallback(
    async (next: EntryContent, base: { id: number; lockVersion: number } | undefined) => {
      inFlight.current = true;
      setState({ kind: 'saving' });
      try {
        const { draft: answer } = base
          ? await saveDraft(base.id, next, base.lockVersion)
          : await createDraft(slug, next);
        setSaved({ id: answer.id, lockVersion: answer.lockVersion, content: next });
        client.setQueryData(deskKeys.draft(answer.id), { draft: { ...answer, content: next } });
        void client.invalidateQueries({ queryKey: deskKeys.all, exact: true });
        savedAt.current = new Date();
        setState({ kind: 'saved', at: savedAt.current });
        if (!base) created.current?.(answer);
      } catch (error) {
        const theirs = draftOfConflict(error);
        setState(theirs && base ? { kind: 'conflict', theirs } : { kind: 'failed', problem: problemOf(error as Error) });
      } finally {
        inFlight.current = false;
      }
    },
    [client, slug],
  );

  // Only a conflict stops saving; after a failure the next change tries again.
  const blocked = state.kind === 'conflict';
  useEffect(() => {
    if (!content) {
      if (!blocked) setState({ kind: 'incomplete' });
      return;
    }
    if (blocked || inFlight.current) return;
    // Nothing to save: what is typed is what the server has (a draft just opened, or a change undone).
    if (saved && same(saved.content, content)) {
      setState((current) => (current.kind === 'unsaved' || current.kind === 'incomplete' ? { kind: 'saved', at: savedAt.current } : current));
      return;
    }
    setState((current) => (current.kind === 'saving' ? current : { kind: 'unsaved' }));
    const timer = setTimeout(() => void write(content, saved), delayMs);
    return () => clearTimeout(timer);
  }, [content, saved, blocked, write, delayMs]);

  return {
    state,
    /** The draft as last saved (id and lock version for submitting). */
    saved,
    /** Try again after a failure. */
    retry: () => content && void write(content, saved),
    /** After a conflict: save this editor's content over the other version, now knowing it. */
    keepMine: () => {
      if (state.kind !== 'conflict' || !content) return;
      void write(content, { id: state.theirs.id, lockVersion: state.theirs.lockVersion });
    },
    /** After a conflict: drop this editor's changes and carry on from the other version. */
    takeTheirs: () => {
      if (state.kind !== 'conflict') return undefined;
      const { theirs } = state;
      setSaved({ id: theirs.id, lockVersion: theirs.lockVersion, content: theirs.content });
      setState({ kind: 'saved', at: new Date(theirs.updatedAt) });
      return theirs;
    },
  };
}
