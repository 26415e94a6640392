/** Printing a page and saving a file need a browser: off the web there is neither, and the buttons hide. */
export const printPage: (() => void) | null = null;

/** Saves text as a file on this device (web only). */
export const downloadText: ((fileName: string, text: string, mimeType: string) => void) | null = null;
