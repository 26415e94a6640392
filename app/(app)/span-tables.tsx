import { LazySpanTableBuilder, WorkspaceSuspense } from '@/lib/ui/lazy-workspace';

export default function SpanTablesPage() {
  return (
    <WorkspaceSuspense>
      <LazySpanTableBuilder />
    </WorkspaceSuspense>
  );
}
