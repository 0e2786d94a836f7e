import { useLocalSearchParams } from 'expo-router';
import { VerifyScreen } from '@/components/auth/VerifyScreen';
import { readQuery } from '@/components/worksheet/permalink';

export default function VerifyRoute() {
  const { token } = readQuery(useLocalSearchParams());
  return <VerifyScreen token={token} />;
}
