import { NotFoundView } from '@/lib/ui/not-found-view';

export default function NotFound() {
  return <NotFoundView />;
}
