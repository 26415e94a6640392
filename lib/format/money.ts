/**
 * Whole cents as dollars for a reader: "$12,345" rounded to the dollar, or "$12,345.67" with the cents.
 * A negative amount carries a minus sign.
 *
 * @param cents whole cents
 * @param withCents show the cents (default false: rounded to the dollar, half up)
 * @example formatDollars(1234567, true) // "$12,345.67"
 * Reference: display convention (US dollars, thousands separator).
 */
export function formatDollars(cents: number, withCents = false): string {
  const sign = cents < 0 ? '-' : '';
  const magnitude = Math.abs(cents);
  const whole = withCents ? Math.floor(magnitude / 100) : Math.floor((magnitude + 50) / 100);
  const grouped = String(whole).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return `${sign}$${grouped}${withCents ? `.${String(magnitude % 100).padStart(2, '0')}` : ''}`;
}
