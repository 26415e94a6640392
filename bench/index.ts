import { existsSync } from 'node:fs';
import { apiFigures } from './api';
import { engineFigures } from './engine';
import { printTable, type Figure } from './figures';
import { pdfFigures } from './pdf';
import { webFigures } from './web';

// npm run bench: the engine, the API (bench/api.ts), the first screen (bench/web.ts, when the web app is
// exported and chromium is there; `-- --no-web` skips it) and the request PDF (bench/pdf.ts), then one table
// of every figure and the machine.
// The browser part is heavy: on a shared machine run it under the browser lock (README).

const CHROMIUM = process.env.CHROMIUM_PATH || '/usr/bin/chromium';

async function main(): Promise<void> {
  const figures: Figure[] = [];
  const engine = engineFigures();
  printTable('engine', engine);
  figures.push(...engine);

  const api = await apiFigures();
  printTable('API', api);
  figures.push(...api);

  const web = process.argv.includes('--no-web')
    ? 'skipped (--no-web)'
    : !existsSync('dist/index.html')
      ? 'not run: export the web app first (npm run build:web)'
      : !existsSync(CHROMIUM)
        ? `not run: no chromium at ${CHROMIUM}`
        : undefined;
  if (web)
    figures.push({ task: 'first screen and member editor (bench/web.ts)', measured: web, target: '—' });
  else figures.push(...(await webFigures()));

  const pdf = await pdfFigures();
  printTable('PDF', pdf);
  figures.push(...pdf);
  printTable('Tributary benchmarks (npm run bench)', figures);
}

// The calculation pool the PDF bench started keeps a thread ready: end when the table is printed.
main().then(
  () => process.exit(0),
  (error: unknown) => {
    console.error(error);
    process.exit(1);
  },
);
