import { QueueScreen } from '@/components/queue/QueueScreen';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

export default function QueueRoute() {
  usePageTitle(`Queue — ${SITE_NAME}`);
  return <QueueScreen />;
}
