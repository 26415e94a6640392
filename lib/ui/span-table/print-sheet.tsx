import type { PrintSheetModel } from './print-sheet-model';

/** The print layout exists on the web only (print-sheet.web.tsx); elsewhere there is nothing to print to. */
export function PrintSheet(_props: { model: PrintSheetModel }) {
  return null;
}
