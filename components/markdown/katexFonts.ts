/**
 * KaTeX's fonts, shipped with the app. KaTeX's stylesheet (imported in app/_layout.tsx) points at
 * its fonts with paths relative to itself, which Metro does not bundle; so each font file is
 * bundled as an asset here and declared again, under the same family, weight and style, in a
 * stylesheet placed after KaTeX's own, whose declarations therefore win.
 */
import { Asset } from 'expo-asset';
import { Platform } from 'react-native';

const faces: [family: string, weight: 400 | 700, style: 'normal' | 'italic', file: number][] = [
  ['KaTeX_AMS', 400, 'normal', require('katex/dist/fonts/KaTeX_AMS-Regular.ttf')],
  ['KaTeX_Caligraphic', 700, 'normal', require('katex/dist/fonts/KaTeX_Caligraphic-Bold.ttf')],
  ['KaTeX_Caligraphic', 400, 'normal', require('katex/dist/fonts/KaTeX_Caligraphic-Regular.ttf')],
  ['KaTeX_Fraktur', 700, 'normal', require('katex/dist/fonts/KaTeX_Fraktur-Bold.ttf')],
  ['KaTeX_Fraktur', 400, 'normal', require('katex/dist/fonts/KaTeX_Fraktur-Regular.ttf')],
  ['KaTeX_Main', 700, 'normal', require('katex/dist/fonts/KaTeX_Main-Bold.ttf')],
  ['KaTeX_Main', 700, 'italic', require('katex/dist/fonts/KaTeX_Main-BoldItalic.ttf')],
  ['KaTeX_Main', 400, 'italic', require('katex/dist/fonts/KaTeX_Main-Italic.ttf')],
  ['KaTeX_Main', 400, 'normal', require('katex/dist/fonts/KaTeX_Main-Regular.ttf')],
  ['KaTeX_Math', 700, 'italic', require('katex/dist/fonts/KaTeX_Math-BoldItalic.ttf')],
  ['KaTeX_Math', 400, 'italic', require('katex/dist/fonts/KaTeX_Math-Italic.ttf')],
  ['KaTeX_SansSerif', 700, 'normal', require('katex/dist/fonts/KaTeX_SansSerif-Bold.ttf')],
  ['KaTeX_SansSerif', 400, 'italic', require('katex/dist/fonts/KaTeX_SansSerif-Italic.ttf')],
  ['KaTeX_SansSerif', 400, 'normal', require('katex/dist/fonts/KaTeX_SansSerif-Regular.ttf')],
  ['KaTeX_Script', 400, 'normal', require('katex/dist/fonts/KaTeX_Script-Regular.ttf')],
  ['KaTeX_Size1', 400, 'normal', require('katex/dist/fonts/KaTeX_Size1-Regular.ttf')],
  ['KaTeX_Size2', 400, 'normal', require('katex/dist/fonts/KaTeX_Size2-Regular.ttf')],
  ['KaTeX_Size3', 400, 'normal', require('katex/dist/fonts/KaTeX_Size3-Regular.ttf')],
  ['KaTeX_Size4', 400, 'normal', require('katex/dist/fonts/KaTeX_Size4-Regular.ttf')],
  ['KaTeX_Typewriter', 400, 'normal', require('katex/dist/fonts/KaTeX_Typewriter-Regular.ttf')],
];

/** The @font-face rules for KaTeX's fonts at the addresses the bundler gave them. */
export function katexFontFaces(): string {
  return faces
    .map(
      ([family, weight, style, file]) =>
        `@font-face{font-display:block;font-family:${family};font-style:${style};font-weight:${weight};` +
        `src:url("${Asset.fromModule(file).uri}") format("truetype")}`,
    )
    .join('\n');
}

/** On the web, once: adds the font declarations at the end of the document's head. */
export function installKatexFonts() {
  if (Platform.OS !== 'web' || typeof document === 'undefined' || document.getElementById('cw-katex-fonts')) return;
  const style = document.createElement('style');
  style.id = 'cw-katex-fonts';
  style.textContent = katexFontFaces();
  document.head.appendChild(style);
}
