import { useLocalSearchParams } from 'expo-router';
import { DraftScreen } from '@/components/desk/DraftScreen';
import { NotFoundScreen } from '@/components/screens/NotFoundScreen';

export default function DraftRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  if (!/^[1-9]\d*$/.test(id)) return <NotFoundScreen />;
  return <DraftScreen key={id} id={Number(id)} />;
}
