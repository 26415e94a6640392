import type { BrowserContext } from 'playwright-core';

/** An invented 6 ft roof-loaded header, 2-ply 2x10 Douglas Fir-Larch No.2 (demo inputs, not a design). */
export const DEMO_HEADER_INPUT = {
  kind: 'header',
  edition: 'ASCE 7-22',
  clearSpanFt: 6,
  sources: [{ kind: 'roof', tributaryFt: 13, deadPsf: 15, roofLivePsf: 20 }],
  materialId: 'sawn-douglas-fir-larch-no2',
  sizeId: '2-ply-2x10',
} as const;

/**
 * Puts the demo header on a job through the API as the signed-in person of `context` (the member editor has
 * its own browser test) and answers the API's response.
 */
export function postDemoHeader(context: BrowserContext, baseUrl: string, jobId: string, label: string) {
  return context.request.post(`${baseUrl}/api/jobs/${jobId}/members`, {
    headers: { Origin: baseUrl },
    data: { label, input: DEMO_HEADER_INPUT },
  });
}
