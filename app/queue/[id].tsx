import { useLocalSearchParams } from 'expo-router';
import { deferred } from '@/components/lazy/deferred';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

const QueueItemScreen = deferred('QueueItemScreen');

export default function QueueItemRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  usePageTitle(`Queue item ${id} — ${SITE_NAME}`);
  return <QueueItemScreen key={id} id={Number(id)} />;
}
