import { QueryClientProvider } from '@tanstack/react-query';
// KaTeX's rules for the math in entries (Metro bundles CSS on the web); its fonts come from installKatexFonts.
import 'katex/dist/katex.min.css';
import '@/components/print/print.css'; // printing entries and claim checks: no navigation or inputs, the permanent address at the end
import { useFonts, type FontSource } from 'expo-font';
import { Slot } from 'expo-router';
import { StatusBar } from 'expo-status-bar';
import { useState } from 'react';
import { Platform } from 'react-native';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { createQueryClient } from '@/components/queries/client';
import { installKatexFonts } from '@/components/markdown/katexFonts';
import { Shell } from '@/components/Shell';
import { fonts } from '@/components/theme';

installKatexFonts();

/**
 * The app's TTF fonts, registered by expo-font, on iOS and Android only. On the web the fonts are
 * WOFF2 subsets declared in public/index.html (scripts/web-fonts.ts) with `font-display: swap`, so
 * the page never waits for them; the export folds `Platform.OS` to 'web' and drops these files.
 */
const NATIVE_FONTS: Record<string, FontSource> =
  Platform.OS === 'web'
    ? {}
    : {
        [fonts.sans]: require('@expo-google-fonts/ibm-plex-sans/400Regular/IBMPlexSans_400Regular.ttf'),
        [fonts.sansSemiBold]: require('@expo-google-fonts/ibm-plex-sans/600SemiBold/IBMPlexSans_600SemiBold.ttf'),
        [fonts.serif]: require('@expo-google-fonts/source-serif-4/400Regular/SourceSerif4_400Regular.ttf'),
        [fonts.serifSemiBold]: require('@expo-google-fonts/source-serif-4/600SemiBold/SourceSerif4_600SemiBold.ttf'),
        [fonts.mono]: require('@expo-google-fonts/ibm-plex-mono/400Regular/IBMPlexMono_400Regular.ttf'),
      };

/** Native: the first paint is in our own fonts; if they cannot load, the system fonts stand in rather than a blank screen. */
function useNativeFonts(): boolean {
  const [loaded, error] = useFonts(NATIVE_FONTS);
  return loaded || error !== null;
}

const useAppFonts: () => boolean = Platform.OS === 'web' ? () => true : useNativeFonts;

export default function RootLayout() {
  const [queryClient] = useState(createQueryClient);
  const fontsReady = useAppFonts();
  if (!fontsReady) return null;

  return (
    <QueryClientProvider client={queryClient}>
      <SafeAreaProvider>
        <StatusBar style="auto" />
        <Shell>
          <Slot />
        </Shell>
      </SafeAreaProvider>
    </QueryClientProvider>
  );
}
