import { IBMPlexMono_400Regular } from '@expo-google-fonts/ibm-plex-mono/400Regular';
import { IBMPlexSans_400Regular } from '@expo-google-fonts/ibm-plex-sans/400Regular';
import { IBMPlexSans_600SemiBold } from '@expo-google-fonts/ibm-plex-sans/600SemiBold';
import { SourceSerif4_400Regular } from '@expo-google-fonts/source-serif-4/400Regular';
import { SourceSerif4_600SemiBold } from '@expo-google-fonts/source-serif-4/600SemiBold';
import { QueryClientProvider } from '@tanstack/react-query';
// KaTeX's rules for the math in entries (Metro bundles CSS on the web); its fonts come from installKatexFonts.
import 'katex/dist/katex.min.css';
import '@/components/print/print.css'; // printing entries and claim checks: no navigation or inputs, the permanent address at the end
import { useFonts } from 'expo-font';
import { Slot } from 'expo-router';
import { StatusBar } from 'expo-status-bar';
import { useState } from 'react';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { createQueryClient } from '@/components/queries/client';
import { installKatexFonts } from '@/components/markdown/katexFonts';
import { Shell } from '@/components/Shell';
import { fonts } from '@/components/theme';

installKatexFonts();

export default function RootLayout() {
  const [queryClient] = useState(createQueryClient);
  const [fontsLoaded, fontError] = useFonts({
    [fonts.sans]: IBMPlexSans_400Regular,
    [fonts.sansSemiBold]: IBMPlexSans_600SemiBold,
    [fonts.serif]: SourceSerif4_400Regular,
    [fonts.serifSemiBold]: SourceSerif4_600SemiBold,
    [fonts.mono]: IBMPlexMono_400Regular,
  });

  // First paint is in our own fonts; if they cannot load, the system fonts stand in rather than a blank page.
  if (!fontsLoaded && !fontError) return null;

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
