import { formatDollars } from '@/lib/format/money';
import type { ChangeOrder } from '@/shared/schemas/budgets';
import { Notice } from '../notice';
import { Text } from '../text';

/** Money as a change: "+$700", "-$200", "$0". */
export const changeText = (cents: number) => `${cents > 0 ? '+' : ''}${formatDollars(cents)}`;

/**
 * The change order raised when the engineer's member differs from the budgeted one: what changed, and the
 * designed member's cost against the budget it compares with: the one sent to the client when there is one
 * (to the client: the difference to agree before work), else the preliminary range.
 */
export function ChangeOrderNotice({ change, testID }: { change: ChangeOrder; testID?: string }) {
  const [from, to] = [change.fromHighCents, change.fromLowCents].sort((a, b) => a - b);
  return (
    <Notice tone="warning" title="Change order" testID={testID ?? 'change-order'}>
      <Text variant="bodyStrong">
        Budgeted {change.budgetedLabel}; the engineer designed {change.designedLabel}.
      </Text>
      <Text>{change.differences.join('; ')}.</Text>
      <Text testID="change-order-cost">
        {formatDollars(change.designedCents)} at the engineer’s member:{' '}
        {from === to ? changeText(from) : `${changeText(from)} to ${changeText(to)}`} against {change.against}
        {change.outsideRange ? ', outside it' : ', inside it'}.
      </Text>
    </Notice>
  );
}
