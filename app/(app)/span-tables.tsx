import { SpanTableBuilder } from '@/lib/ui/span-table/span-table-builder';

export default function SpanTablesPage() {
  return <SpanTableBuilder />;
}
