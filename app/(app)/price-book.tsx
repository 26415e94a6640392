import { LazyPriceBookScreen, WorkspaceSuspense } from '@/lib/ui/lazy-workspace';

export default function PriceBookPage() {
  return (
    <WorkspaceSuspense>
      <LazyPriceBookScreen />
    </WorkspaceSuspense>
  );
}
