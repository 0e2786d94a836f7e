import { useLocalSearchParams } from 'expo-router';
import { deferred } from '@/components/lazy/deferred';
import { readQuery } from '@/components/worksheet/permalink';

// The page title needs the check kit (mathjs), so the deferred part sets it.
const CheckPage = deferred('CheckPage');

export default function CheckRoute() {
  const { name, ...query } = useLocalSearchParams<{ name: string }>();
  return <CheckPage name={name} query={readQuery(query)} />;
}
