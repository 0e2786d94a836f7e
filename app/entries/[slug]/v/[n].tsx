import { useLocalSearchParams } from 'expo-router';
import { EntryScreen } from '@/components/entry/EntryScreen';
import { NotFoundScreen } from '@/components/screens/NotFoundScreen';

export default function EntryVersionRoute() {
  const { slug, n } = useLocalSearchParams<{ slug: string; n: string }>();
  if (!/^[1-9]\d*$/.test(n)) return <NotFoundScreen />;
  return <EntryScreen key={`${slug}/${n}`} slug={slug} version={Number(n)} />;
}
