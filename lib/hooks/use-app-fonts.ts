import { useFonts } from 'expo-font';
import { appFontFiles } from './app-font-files';

/** Loads the app's fonts. True once loaded, or once loading failed (system font). */
export function useAppFonts(): boolean {
  const [loaded, error] = useFonts(appFontFiles);
  return loaded || error !== null;
}
