import { PriceBookScreen } from '@/lib/ui/budget/price-book-screen';

export default function PriceBookPage() {
  return <PriceBookScreen />;
}
