import { useEffect, useInsertionEffect, useState } from 'react';
import { Platform, Pressable, StyleSheet, Text, View, type ViewStyle } from 'react-native';
import type { EntryContent } from '@/shared/entries/schema';
import { dataAttributes } from '../worksheet/dataAttributes';
import { colors, focusRing, radius, space, type } from '../theme';
import { presentSections, sectionAnchor, sectionTitles } from './sections';

/** One line of an entry's table of contents: the anchor it leads to and the title it shows. */
export interface ContentsItem {
  key: string;
  anchor: string;
  label: string;
}

/** The sections this version has, then the parts of the page after the text (versions, citing). */
export function contentsOf(content: EntryContent): ContentsItem[] {
  return [
    ...presentSections(content).map((field) => ({ key: field, anchor: sectionAnchor(field), label: sectionTitles[field] })),
    { key: 'versions', anchor: sectionAnchor('versions'), label: 'Versions' },
    { key: 'cite', anchor: sectionAnchor('cite'), label: 'Cite this version' },
  ];
}

/**
 * Scrolls the page to an anchor and moves keyboard focus there (without a second scroll), so that
 * the next Tab continues from the section the reader chose. On the web only; elsewhere a no-op.
 */
export function scrollToAnchor(anchor: string): void {
  if (Platform.OS !== 'web' || typeof document === 'undefined') return;
  const target = document.getElementById(anchor);
  if (!target) return;
  target.scrollIntoView?.({ block: 'start' });
  if (!target.hasAttribute('tabindex')) target.setAttribute('tabindex', '-1');
  target.focus?.({ preventScroll: true });
}

/** Anchors stop below the phone's sticky jump menu, and a section focused by a jump draws no ring. */
const css = `
[id^="section-"]{scroll-margin-top:72px}
[id^="section-"]:focus{outline:none}
`;

function useAnchorStyles() {
  useInsertionEffect(() => {
    if (typeof document === 'undefined' || document.getElementById('cw-entry-anchors')) return;
    const style = document.createElement('style');
    style.id = 'cw-entry-anchors';
    style.textContent = css;
    document.head.appendChild(style);
  }, []);
}

/** `position: sticky` is CSS that react-native-web passes through; React Native's types do not list it. */
const sticky = { position: 'sticky', top: 0 } as unknown as ViewStyle;

/**
 * The section being read: of the sections crossing a band near the top of the window, the first in
 * reading order; while none crosses it, the last one marked stays marked. IntersectionObserver sees
 * through the app's own scrolling box. Undefined off the web, or before anything has been seen.
 */
function useSectionInView(anchors: string[]): string | undefined {
  const [current, setCurrent] = useState<string>();
  const key = anchors.join(' ');
  useEffect(() => {
    if (typeof document === 'undefined' || typeof IntersectionObserver === 'undefined') return;
    const ids = key.split(' ');
    const seen = new Set<string>();
    const observer = new IntersectionObserver(
      (records) => {
        for (const r of records) {
          if (r.isIntersecting) seen.add(r.target.id);
          else seen.delete(r.target.id);
        }
        const first = ids.find((id) => seen.has(id));
        if (first) setCurrent(first);
      },
      // A band just below where a jump puts a section's top (72 px, the anchors' scroll margin) down to a quarter of the window.
      { rootMargin: '-80px 0px -75% 0px' },
    );
    for (const id of ids) {
      const el = document.getElementById(id);
      if (el) observer.observe(el);
    }
    return () => observer.disconnect();
  }, [key]);
  return current;
}

/** Wide screens: the table of contents beside the text, staying in view while the page scrolls; the section in view is marked. */
export function TableOfContents({ items }: { items: ContentsItem[] }) {
  useAnchorStyles();
  const current = useSectionInView(items.map((i) => i.anchor));
  return (
    <View
      role="navigation"
      aria-label="Contents of this entry"
      testID="entry-toc"
      {...dataAttributes({ print: 'hide' })}
      style={[styles.toc, sticky, { top: space.md }]}
    >
      <Text role="heading" aria-level={2} style={styles.tocTitle}>
        Contents
      </Text>
      <View role="list">
        {items.map((item) => (
          <View role="listitem" key={item.key}>
            <Pressable
              role="link"
              testID={`toc-${item.key}`}
              aria-current={current === item.anchor ? 'location' : undefined}
              onPress={() => scrollToAnchor(item.anchor)}
              style={({ pressed }) => [styles.tocItem, current === item.anchor && styles.current, pressed && styles.pressed]}
            >
              <Text style={[styles.tocLabel, current === item.anchor && styles.currentLabel]}>{item.label}</Text>
            </Pressable>
          </View>
        ))}
      </View>
    </View>
  );
}

/**
 * Phones: one control at the top of the entry that opens the list of sections; choosing one scrolls
 * there and closes the list. It stays at the top of the screen while the page scrolls.
 */
export function JumpMenu({ items }: { items: ContentsItem[] }) {
  useAnchorStyles();
  const [open, setOpen] = useState(false);
  return (
    <View testID="entry-jump" {...dataAttributes({ print: 'hide' })} style={[styles.jump, sticky]}>
      <Pressable
        role="button"
        testID="entry-jump-toggle"
        aria-expanded={open}
        aria-controls="entry-jump-list"
        onPress={() => setOpen((o) => !o)}
        style={styles.jumpToggle}
      >
        <Text style={styles.jumpLabel} numberOfLines={1}>
          Contents
        </Text>
        <Text style={styles.jumpMark} aria-hidden>
          {open ? '▴' : '▾'}
        </Text>
      </Pressable>
      {open ? (
        <View role="list" nativeID="entry-jump-list" testID="entry-jump-list" style={styles.jumpList}>
          {items.map((item) => (
            <View role="listitem" key={item.key}>
              <Pressable
                role="link"
                testID={`jump-${item.key}`}
                onPress={() => {
                  setOpen(false);
                  scrollToAnchor(item.anchor);
                }}
                style={styles.jumpItem}
              >
                <Text style={type.ui}>{item.label}</Text>
              </Pressable>
            </View>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  toc: {
    gap: space.xs,
    paddingLeft: space.md,
    borderLeftColor: colors.rule,
    borderLeftWidth: 1,
  },
  tocTitle: { ...type.caption, fontFamily: type.uiStrong.fontFamily, textTransform: 'uppercase', letterSpacing: 1 },
  tocItem: { ...focusRing, paddingVertical: space.xxs, paddingHorizontal: space.xs, marginLeft: -space.xs, borderRadius: radius.sm },
  current: { backgroundColor: colors.tealWash },
  currentLabel: { fontFamily: type.uiStrong.fontFamily, color: colors.ink },
  pressed: { backgroundColor: colors.tealWash },
  tocLabel: { ...type.ui, fontSize: 15, color: colors.teal },
  jump: {
    zIndex: 2,
    marginHorizontal: -space.md,
    paddingHorizontal: space.md,
    paddingVertical: space.xs,
    backgroundColor: colors.paper,
    borderBottomColor: colors.rule,
    borderBottomWidth: 1,
  },
  jumpToggle: {
    ...focusRing,
    minHeight: 44,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: space.sm,
    paddingHorizontal: space.sm,
    borderColor: colors.ruleStrong,
    borderWidth: 1,
    borderRadius: radius.sm,
    backgroundColor: colors.surface,
  },
  jumpLabel: { ...type.uiStrong, flexShrink: 1 },
  jumpMark: { ...type.ui, color: colors.inkMuted },
  jumpList: {
    marginTop: space.xs,
    borderColor: colors.rule,
    borderWidth: 1,
    borderRadius: radius.sm,
    backgroundColor: colors.surface,
  },
  jumpItem: { ...focusRing, minHeight: 44, justifyContent: 'center', paddingHorizontal: space.sm, borderBottomColor: colors.rule, borderBottomWidth: 1 },
});
