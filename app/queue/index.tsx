import { deferred } from '@/components/lazy/deferred';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

const QueueScreen = deferred('QueueScreen');

export default function QueueRoute() {
  usePageTitle(`Queue — ${SITE_NAME}`);
  return <QueueScreen />;
}
