import { Linking } from 'react-native';

/** Off the web the device opens the file's address; the browser build saves it (download-file.web.ts). */
export async function downloadFile(path: string, _fileName: string): Promise<void> {
  await Linking.openURL(path);
}
