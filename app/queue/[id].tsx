import { useLocalSearchParams } from 'expo-router';
import { QueueItemScreen } from '@/components/queue/QueueItemScreen';

export default function QueueItemRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <QueueItemScreen key={id} id={Number(id)} />;
}
