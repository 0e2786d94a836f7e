import { useLocalSearchParams } from 'expo-router';
import { CheckScreen } from '@/components/checks/CheckScreen';
import { readQuery } from '@/components/worksheet/permalink';

export default function CheckRoute() {
  const { name, ...query } = useLocalSearchParams<{ name: string }>();
  return <CheckScreen name={name} query={readQuery(query)} />;
}
