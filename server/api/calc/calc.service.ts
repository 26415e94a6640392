import { checkMember } from '@/lib/calc';
import { runInPool } from '@/server/services/calc-pool';
import type { MemberCheckResult } from '@/shared/schemas/calc/member';
import type { MemberCheckRequest } from '@/shared/schemas/calc/requests';
import type { ShortlistInput } from '@/shared/schemas/calc/shortlist';
import type { SpanTableInput } from '@/shared/schemas/calc/span-table';

/**
 * The engine behind the stateless calculation routes: nothing is read or stored. One member check is
 * quick and runs here; a shortlist or span table can take a few hundred milliseconds, so it runs in the
 * worker pool and comes back as JSON text. The engine's CalcInputError reaches the error handler either
 * way, which answers 400 naming the field.
 */
export function createCalcService() {
  return {
    check(request: MemberCheckRequest): MemberCheckResult {
      const { diagrams, ...input } = request;
      return checkMember(input, { diagrams });
    },

    /** The shortlist result (ShortlistResult) as JSON text. */
    shortlist(input: ShortlistInput): Promise<string> {
      return runInPool('shortlist', input);
    },

    /** The span table result (SpanTableResult) as JSON text. */
    spanTable(input: SpanTableInput): Promise<string> {
      return runInPool('spanTable', input);
    },
  };
}

export type CalcService = ReturnType<typeof createCalcService>;
