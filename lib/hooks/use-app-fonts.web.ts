import { useFonts } from 'expo-font';
import { appFontFiles } from './app-font-files';

/**
 * On the web the first screen does not wait for the four Inter files (about 1.4 MB): text draws at once in
 * the fallback face and takes Inter as the files arrive, so a phone on a slow link can act sooner.
 */
export function useAppFonts(): boolean {
  useFonts(appFontFiles);
  return true;
}
