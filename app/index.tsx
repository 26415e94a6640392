import { HomeRedirect } from '@/lib/ui/home-redirect';

export default function Index() {
  return <HomeRedirect />;
}
