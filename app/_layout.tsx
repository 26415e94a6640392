import { Slot } from 'expo-router';
import { useAppFonts } from '@/lib/hooks/use-app-fonts';
import { AppProviders } from '@/lib/ui/app-providers';
import { LoadingView } from '@/lib/ui/loading-view';

export default function RootLayout() {
  const fontsReady = useAppFonts();
  return <AppProviders>{fontsReady ? <Slot /> : <LoadingView />}</AppProviders>;
}
