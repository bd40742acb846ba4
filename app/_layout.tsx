import { Inter_400Regular } from '@expo-google-fonts/inter/400Regular';
import { Inter_600SemiBold } from '@expo-google-fonts/inter/600SemiBold';
import { Inter_700Bold } from '@expo-google-fonts/inter/700Bold';
import { JetBrainsMono_400Regular } from '@expo-google-fonts/jetbrains-mono/400Regular';
import { QueryClientProvider } from '@tanstack/react-query';
import { useFonts } from 'expo-font';
import { Slot } from 'expo-router';
import { useState } from 'react';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { makeQueryClient } from '@/hooks/query-client';
import { FullScreenLoading } from '@/components/shell/loading';

export default function RootLayout() {
  const [client] = useState(makeQueryClient);
  const [loaded, error] = useFonts({ Inter_400Regular, Inter_600SemiBold, Inter_700Bold, JetBrainsMono_400Regular });
  return (
    <SafeAreaProvider>
      <QueryClientProvider client={client}>{loaded || error ? <Slot /> : <FullScreenLoading />}</QueryClientProvider>
    </SafeAreaProvider>
  );
}
