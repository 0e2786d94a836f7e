import { useEffect } from 'react';
import { Platform } from 'react-native';

/** The name every page title ends with. */
export const SITE_NAME = 'Counterweight';

/** The description of the site as a whole (public/index.html): for screens that give none of their own. */
export const SITE_DESCRIPTION = 'Vetted, citable physics objections to impossible-machine claims.';

function setMeta(selector: string, attr: 'name' | 'property', key: string, content: string): void {
  let el = document.head.querySelector<HTMLMetaElement>(selector);
  if (!el) {
    el = document.createElement('meta');
    el.setAttribute(attr, key);
    document.head.appendChild(el);
  }
  el.setAttribute('content', content);
}

/**
 * Sets the browser tab's title (and, when given, the page description used by link previews) while the
 * screen is shown. Titles read "<what> — Counterweight". A no-op off the web.
 */
export function usePageTitle(title: string, description?: string): void {
  useEffect(() => {
    if (Platform.OS !== 'web' || typeof document === 'undefined') return;
    document.title = title;
    setMeta('meta[property="og:title"]', 'property', 'og:title', title);
    // A screen without a description of its own does not keep the one of the screen before it.
    const words = description || SITE_DESCRIPTION;
    setMeta('meta[name="description"]', 'name', 'description', words);
    setMeta('meta[property="og:description"]', 'property', 'og:description', words);
  }, [title, description]);
}
