import { NotFoundScreen } from '@/components/screens/NotFoundScreen';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

export default function NotFoundRoute() {
  usePageTitle(`Page not found — ${SITE_NAME}`);
  return <NotFoundScreen />;
}
