/** Downloading a package and picking a file need a browser here: off the web there is neither. */
export const openDownload: ((path: string) => void) | null = null;

/** Asks for one file from the camera roll or the disk (web only). */
export const pickFile: ((accept: string) => Promise<File | null>) | null = null;
