import type { ScreenWithHistory } from '@/shared/schemas/bearing-screens';
import { requestComposeSchema, type RequestCompose } from '@/shared/schemas/requests/compose';

/** The longest note a request's existing-condition field takes (shared/schemas/requests/compose.ts). */
const NOTE_MAX = 2000;

/** The lines of text, as many whole ones as fit in `max` characters. */
function fitLines(lines: string[], max: number): string {
  let text = '';
  for (const line of lines) {
    const next = text === '' ? line : `${text}\n${line}`;
    if (next.length > max) break;
    text = next;
  }
  return text;
}

/**
 * The screen's "engineer required" reasons as the text of a request's bearing-points note: the wall, the
 * screen's version, and each reason that calls for an engineer with whether it was seen or assumed and its
 * source, so the engineer reads what the contractor found and on what basis.
 */
export function screenReasonsNote(screen: ScreenWithHistory): string {
  const engineer = screen.result.reasons.filter((r) => r.kind === 'engineer');
  const lines = [
    `Bearing screen of the wall "${screen.wallLabel}" (version ${screen.version}): engineer required.`,
    ...(engineer.length > 0
      ? engineer.map(
          (r) =>
            `• ${r.text} (${r.basis === 'assumed' ? 'assumed' : r.basis === 'seen' ? 'seen' : 'not seen'}; ${r.source})`,
        )
      : screen.result.engineerReasons.map((r) => `• ${r}`)),
  ];
  return fitLines(lines, NOTE_MAX);
}

/** A new request's working copy started from a screen: its reasons in the bearing-points note. */
export function composeFromScreen(screen: ScreenWithHistory): RequestCompose {
  return requestComposeSchema.parse({ conditions: { bearingPoints: screenReasonsNote(screen) } });
}
