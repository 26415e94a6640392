import { amountScale, catalogueItem } from './price-catalogue';
import type { Cents, BasisPoints } from './money';

/** A firm's price book as the budget reads it: item key → whole-number amount (see price-catalogue). */
export type PriceAmounts = ReadonlyMap<string, number>;

/** Reads a price book: money in cents, percentages in basis points, quantities in their own units. */
export interface PriceReader {
  /** Cents, or null when the price book has no price for the key. */
  cents(key: string): Cents | null;
  /** Basis points (0 when missing: a missing markup adds nothing, and is listed as missing). */
  rate(key: string): BasisPoints;
  /** Hours, days, ft, in, lb or a count (0 when missing). */
  quantity(key: string): number;
  /** The catalogue label of an item. */
  label(key: string): string;
  /** Keys asked for and not found, in the order they were asked. */
  missing(): string[];
}

/**
 * A reader over a price book's amounts that remembers every key it could not find.
 * @param amounts item key → stored amount (cents, basis points or thousandths by the item's unit)
 * @returns the reader; a key the catalogue cannot hold (a sawn length past 20 ft) reads as missing
 * @example priceReader(new Map([['rate/carpenter', 6500]])).cents('rate/carpenter') // 6500
 * Reference: Tributary price book convention (integer amounts).
 */
export function priceReader(amounts: PriceAmounts): PriceReader {
  const missing: string[] = [];
  const read = (key: string): number | null => {
    const amount = catalogueItem(key) ? amounts.get(key) : undefined;
    if (amount === undefined) {
      if (!missing.includes(key)) missing.push(key);
      return null;
    }
    return amount;
  };
  return {
    cents: (key) => read(key),
    rate: (key) => read(key) ?? 0,
    quantity: (key) => {
      const amount = read(key);
      const item = catalogueItem(key);
      return amount === null || !item ? 0 : amount / amountScale(item.unit);
    },
    label: (key) => catalogueItem(key)?.label ?? key,
    missing: () => [...missing],
  };
}
