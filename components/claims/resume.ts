/**
 * A claim check kept across signing in to save it: a reader who is not signed in presses Save, is
 * sent to the sign-in screen, and comes back (`/check?resume=1`) to the same text, figures, choices
 * and result, ready to save. On the web it lives in sessionStorage (this tab only, gone when the tab
 * is closed); elsewhere in memory. It is cleared once the check is saved.
 */
import { Platform } from 'react-native';
import { PARAGRAPH_VARIANTS, type ParagraphVariant } from '@/shared/claims/types';
import { CITATION_STYLES, type CitationStyle, type ClaimCheckRequest, type ClaimCheckResult } from '@/shared/api-types';
import type { FigureDraft } from './figures';

const KEY = 'counterweight.claim-check.resume';
const VERSION = 1;

export interface ResumeState {
  /** The text in the box (may differ from the text the result is for). */
  text: string;
  style: CitationStyle;
  variant: ParagraphVariant;
  drafts: FigureDraft[];
  /** The request that produced the result: what a save stores. */
  request: ClaimCheckRequest;
  /** The result on screen; left out when the browser's storage had no room (it is computed again). */
  result: ClaimCheckResult | null;
}

/** Where to come back to after signing in. */
export const RESUME_PATH = '/check?resume=1';

let memory: string | null = null;

function storage(): Pick<Storage, 'getItem' | 'setItem' | 'removeItem'> | null {
  if (Platform.OS !== 'web') {
    return {
      getItem: () => memory,
      setItem: (_k, v) => void (memory = v),
      removeItem: () => void (memory = null),
    };
  }
  try {
    return typeof window !== 'undefined' && window.sessionStorage ? window.sessionStorage : null;
  } catch {
    // Storage disabled by the browser's settings.
    return null;
  }
}

/**
 * Keeps the check for after signing in. Only what is needed is kept: the result is dropped first
 * when there is no room for it. Answers false when nothing could be kept at all.
 */
export function keepForSignIn(state: ResumeState): boolean {
  const store = storage();
  if (!store) return false;
  const write = (s: ResumeState) => store.setItem(KEY, JSON.stringify({ v: VERSION, ...s }));
  try {
    write(state);
    return true;
  } catch {
    try {
      write({ ...state, result: null });
      return true;
    } catch {
      return false;
    }
  }
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** The kept check, if there is one this tab can read; anything malformed counts as none. */
export function readKept(): ResumeState | null {
  const store = storage();
  let raw: string | null = null;
  try {
    raw = store?.getItem(KEY) ?? null;
  } catch {
    return null;
  }
  if (!raw) return null;
  try {
    const v: unknown = JSON.parse(raw);
    if (!isObject(v) || v.v !== VERSION) return null;
    const { text, style, variant, drafts, request, result } = v;
    if (typeof text !== 'string' || !CITATION_STYLES.includes(style as CitationStyle)) return null;
    if (!PARAGRAPH_VARIANTS.includes(variant as ParagraphVariant) || !Array.isArray(drafts)) return null;
    if (!isObject(request) || typeof request.text !== 'string') return null;
    if (result !== null && !(isObject(result) && Array.isArray(result.figures) && isObject(result.paragraph))) return null;
    return {
      text,
      style: style as CitationStyle,
      variant: variant as ParagraphVariant,
      drafts: drafts as FigureDraft[],
      request: request as unknown as ClaimCheckRequest,
      result: result as ClaimCheckResult | null,
    };
  } catch {
    return null;
  }
}

/** Forgets the kept check (once saved). */
export function forgetKept(): void {
  try {
    storage()?.removeItem(KEY);
  } catch {
    // Nothing kept, or storage disabled: nothing to forget.
  }
}
