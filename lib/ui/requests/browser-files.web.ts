/** Follows a same-origin download link (the session cookie goes with it; the server names the file). */
export function openDownload(path: string): void {
  const link = document.createElement('a');
  link.href = path;
  link.download = '';
  document.body.appendChild(link);
  link.click();
  link.remove();
}

/** Opens the file chooser (on a phone: the camera roll or the camera) and answers the chosen file. */
export function pickFile(accept: string): Promise<File | null> {
  return new Promise((resolve) => {
    const input = document.createElement('input');
    input.type = 'file';
    input.accept = accept;
    input.style.display = 'none';
    input.addEventListener('change', () => {
      resolve(input.files?.[0] ?? null);
      input.remove();
    });
    input.addEventListener('cancel', () => {
      resolve(null);
      input.remove();
    });
    document.body.appendChild(input);
    input.click();
  });
}
