import { useEffect } from 'react';
import { colors, fonts } from '@/lib/theme';
import type { PrintSheetModel } from './print-sheet-model';

const SHEET_ID = 'span-table-print';
const S = `#${SHEET_ID}`;

/** On screen the sheet is hidden; in print it is all there is, on a letter page, without the app around it. */
const PRINT_CSS = `
${S} { display: none; }
@media print {
  @page { size: letter portrait; margin: 0.5in; }
  html, body { height: auto !important; overflow: visible !important; background: none !important; }
  body > :not(${S}) { display: none !important; }
  ${S} { display: block; color: ${colors.ink}; font-family: '${fonts.regular}', system-ui, sans-serif; font-size: 9pt; line-height: 1.35; }
  ${S} h1 { font-family: '${fonts.bold}', system-ui, sans-serif; font-size: 14pt; margin: 0 0 4pt; }
  ${S} h2 { font-family: '${fonts.semibold}', system-ui, sans-serif; font-size: 10pt; margin: 10pt 0 3pt; }
  ${S} p, ${S} ul { margin: 0 0 4pt; }
  ${S} ul { padding-left: 12pt; }
  ${S} table { border-collapse: collapse; width: 100%; }
  ${S} th, ${S} td { border: 0.5pt solid ${colors.lineStrong}; padding: 1.5pt 4pt; vertical-align: top; }
  ${S} thead { display: table-header-group; }
  ${S} tr { break-inside: avoid; }
  ${S} .spans th, ${S} .spans td { text-align: right; white-space: nowrap; font-variant-numeric: tabular-nums; }
  ${S} .spans { table-layout: fixed; }
  ${S} .spans th:first-child, ${S} .spans tbody th { text-align: left; width: 22%; white-space: normal; }
  ${S} .assumptions th { text-align: left; width: 28%; }
  ${S} .caution { border-left: 3pt solid ${colors.ink}; padding: 2pt 0 2pt 6pt; margin: 6pt 0; break-inside: avoid; }
}`;

function el(tag: string, text?: string, children: Node[] = [], className?: string): HTMLElement {
  const node = document.createElement(tag);
  if (text !== undefined) node.textContent = text;
  if (className) node.className = className;
  for (const child of children) node.appendChild(child);
  return node;
}

const list = (items: readonly string[]) =>
  el(
    'ul',
    undefined,
    items.map((item) => el('li', item)),
  );

function spansTable(model: PrintSheetModel): HTMLElement {
  const head = el('thead', undefined, [
    el(
      'tr',
      undefined,
      model.columns.map((c) => el('th', c)),
    ),
  ]);
  const body = el(
    'tbody',
    undefined,
    model.rows.map(([size, ...cells]) =>
      el('tr', undefined, [el('th', size), ...cells.map((c) => el('td', c))]),
    ),
  );
  return el('table', undefined, [head, body], 'spans');
}

function sheet(model: PrintSheetModel): HTMLElement {
  const caution = el(
    'p',
    undefined,
    [el('strong', 'Caution: '), document.createTextNode(model.caution)],
    'caution',
  );
  const assumptions = el(
    'table',
    undefined,
    [
      el(
        'tbody',
        undefined,
        model.assumptions.map((a) => el('tr', undefined, [el('th', a.label), el('td', a.value)])),
      ),
    ],
    'assumptions',
  );
  const parts: Node[] = [
    el('style', PRINT_CSS),
    el('h1', model.title),
    el('p', model.heading),
    caution,
    spansTable(model),
    el('p', `Key: ${model.legend.join(' · ')}`),
    el('h2', 'Assumptions'),
    assumptions,
  ];
  if (model.warnings.length) parts.push(el('h2', 'Warnings'), list(model.warnings));
  parts.push(el('h2', 'Notes'), list(model.notes), el('h2', 'Sources'), list(model.sources));
  parts.push(el('p', `Built with Tributary on ${new Date().toLocaleDateString()}.`));
  const section = el('section', undefined, parts);
  section.id = SHEET_ID;
  return section;
}

/**
 * The span table's print layout: a section beside the app's root (built with DOM calls, text only) with its
 * own print stylesheet, so the browser's print — the Print button or the browser's menu — gives the table,
 * its assumptions and the caution on a letter page without the navigation or the form.
 */
export function PrintSheet({ model }: { model: PrintSheetModel }) {
  useEffect(() => {
    const node = sheet(model);
    document.body.appendChild(node);
    return () => node.remove();
  }, [model]);
  return null;
}
