import { buildShortlist, buildSpanTable, checkMember } from '@/lib/calc';
import type { MemberCheckResult } from '@/shared/schemas/calc/member';
import type { MemberCheckRequest } from '@/shared/schemas/calc/requests';
import type { ShortlistInput, ShortlistResult } from '@/shared/schemas/calc/shortlist';
import type { SpanTableInput, SpanTableResult } from '@/shared/schemas/calc/span-table';

/**
 * The engine behind the stateless calculation routes: nothing is read or stored. The engine's
 * CalcInputError passes through to the error handler, which answers 400 naming the field.
 */
export function createCalcService() {
  return {
    check(request: MemberCheckRequest): MemberCheckResult {
      const { diagrams, ...input } = request;
      return checkMember(input, { diagrams });
    },

    shortlist(input: ShortlistInput): ShortlistResult {
      return buildShortlist(input);
    },

    spanTable(input: SpanTableInput): SpanTableResult {
      return buildSpanTable(input);
    },
  };
}

export type CalcService = ReturnType<typeof createCalcService>;
