/**
 * Counterweight's look in one place: colours, spacing, type and fonts.
 * Results are never coloured on a red-to-green scale; marks stay neutral (DESIGN.md §6).
 */
import { Platform, type TextStyle } from 'react-native';

/**
 * The two palettes, light and dark, as hex. Text colours keep at least 4.5:1 against every background
 * they are set on, and the borders of controls (`ruleStrong`) at least 3:1 (WCAG 2.1, 1.4.3 and 1.4.11),
 * in both. The dark palette follows the system setting (`prefers-color-scheme`).
 */
export const palettes = {
  light: {
    /** Warm paper: the page. */
    paper: '#F7F4EE',
    /** A shade deeper than the page: the rail, the bars, quiet panels. */
    paperDeep: '#EFEAE0',
    /** Lighter than the page: fields and cards that sit on it. */
    surface: '#FFFDF9',
    /** Graphite: all reading text. */
    ink: '#1E232B',
    /** Secondary text: captions, hints, inactive navigation. */
    inkMuted: '#596170',
    /** Hairlines between things. */
    rule: '#DCD5C8',
    /** Borders that must be seen: fields, buttons at rest, chips. */
    ruleStrong: '#8A8272',
    /** The one accent: links, the active section, primary actions. */
    teal: '#1F6F6B',
    /** A wash of the accent behind the active section in the rail, and behind "done" messages. */
    tealWash: '#E3EDEB',
    /** Highlights and focus. */
    brass: '#A8782B',
    /** A wash of brass behind notes. */
    brassWash: '#F4EBDA',
    /** Text in brass where it must be read (a note's word): darker than the brass of rules and focus. */
    brassInk: '#76531A',
    /** Problems (a failed request, a refused form): the edge, the word and the wash of an error message. */
    alarm: '#A63A2B',
    alarmInk: '#9A3324',
    alarmWash: '#F8E7E2',
  },
  dark: {
    paper: '#16191E',
    paperDeep: '#1D2127',
    surface: '#23282F',
    ink: '#ECE7DE',
    inkMuted: '#A7AFBB',
    rule: '#383E48',
    ruleStrong: '#7D8592',
    teal: '#6BC3BA',
    tealWash: '#1B3331',
    brass: '#D9A957',
    brassWash: '#33291A',
    brassInk: '#E4B86C',
    alarm: '#E27D6B',
    alarmInk: '#F2A090',
    alarmWash: '#3B211D',
  },
} as const;

export type ColorName = keyof (typeof palettes)['light'];

/** `inkMuted` → `--cw-ink-muted`: the CSS custom property that carries a colour on the web. */
export const cssVariableOf = (name: ColorName) => `--cw-${name.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`)}`;

/**
 * The colours to style with. On the web each is a CSS custom property (`var(--cw-ink)`), defined for
 * light and dark in public/index.html, so the whole app follows the system setting without re-rendering
 * (react-native-web passes `var(...)` through; Chromium resolves it in SVG attributes too). Elsewhere
 * the light palette's hex values.
 */
export const colors: Record<ColorName, string> =
  Platform.OS === 'web'
    ? (Object.fromEntries(Object.keys(palettes.light).map((name) => [name, `var(${cssVariableOf(name as ColorName)})`])) as Record<ColorName, string>)
    : palettes.light;

export const space = {
  xxs: 4,
  xs: 8,
  sm: 12,
  md: 16,
  lg: 24,
  xl: 32,
  xxl: 48,
} as const;

export const radius = {
  sm: 4,
  md: 8,
  pill: 999,
} as const;

/**
 * Family names as registered with expo-font in app/_layout.tsx (iOS, Android); on the web they are
 * the font-family names of the WOFF2 subsets public/index.html declares (scripts/web-fonts.ts).
 * Each weight is its own family, so styles pick a family, not a fontWeight.
 */
export const fonts = {
  sans: 'IBMPlexSans_400Regular',
  sansSemiBold: 'IBMPlexSans_600SemiBold',
  serif: 'SourceSerif4_400Regular',
  serifSemiBold: 'SourceSerif4_600SemiBold',
  mono: 'IBMPlexMono_400Regular',
} as const;

/** Sans for the interface, serif for reading, mono for values and formulas. */
export const type = {
  display: { fontFamily: fonts.serifSemiBold, fontSize: 32, lineHeight: 40, color: colors.ink },
  title: { fontFamily: fonts.serifSemiBold, fontSize: 22, lineHeight: 30, color: colors.ink },
  heading: { fontFamily: fonts.sansSemiBold, fontSize: 18, lineHeight: 26, color: colors.ink },
  reading: { fontFamily: fonts.serif, fontSize: 18, lineHeight: 28, color: colors.ink },
  body: { fontFamily: fonts.serif, fontSize: 16, lineHeight: 25, color: colors.ink },
  ui: { fontFamily: fonts.sans, fontSize: 16, lineHeight: 22, color: colors.ink },
  uiStrong: { fontFamily: fonts.sansSemiBold, fontSize: 16, lineHeight: 22, color: colors.ink },
  caption: { fontFamily: fonts.sans, fontSize: 14, lineHeight: 20, color: colors.inkMuted },
  small: { fontFamily: fonts.sans, fontSize: 12, lineHeight: 17, color: colors.inkMuted },
  mono: { fontFamily: fonts.mono, fontSize: 14, lineHeight: 20, color: colors.ink },
} as const satisfies Record<string, TextStyle>;

export const layout = {
  /** From this window width on, the left rail replaces the bottom bar. */
  wideMinWidth: 960,
  /** Reading column. */
  contentMaxWidth: 760,
  /** Pages with a second column beside the text (an entry's sources and worksheets, the Desk's preview). */
  twoColumnMaxWidth: 1240,
  railWidth: 232,
} as const;

/**
 * Brass focus ring for anything that takes keyboard focus. The browser draws it only on keyboard
 * focus (`:focus-visible`); the style only sets its colour and offset.
 */
export const focusRing = {
  outlineColor: colors.brass,
  outlineOffset: 2,
} as const;
