import { useLocalSearchParams } from 'expo-router';
import { EntryScreen } from '@/components/entry/EntryScreen';

export default function EntryRoute() {
  const { slug } = useLocalSearchParams<{ slug: string }>();
  return <EntryScreen key={slug} slug={slug} />;
}
