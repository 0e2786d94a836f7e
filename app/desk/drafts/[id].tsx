import { useLocalSearchParams } from 'expo-router';
import { deferred } from '@/components/lazy/deferred';
import { NotFoundScreen } from '@/components/screens/NotFoundScreen';

const DraftScreen = deferred('DraftScreen');

export default function DraftRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  if (!/^[1-9]\d*$/.test(id)) return <NotFoundScreen />;
  return <DraftScreen key={id} id={Number(id)} />;
}
