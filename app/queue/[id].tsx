import { useLocalSearchParams } from 'expo-router';
import { QueueItemScreen } from '@/components/queue/QueueItemScreen';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

export default function QueueItemRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  usePageTitle(`Queue item ${id} — ${SITE_NAME}`);
  return <QueueItemScreen key={id} id={Number(id)} />;
}
