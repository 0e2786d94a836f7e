import { useLocalSearchParams } from 'expo-router';
import { ResetScreen } from '@/components/auth/ResetScreen';
import { readQuery } from '@/components/worksheet/permalink';

export default function ResetRoute() {
  const { token } = readQuery(useLocalSearchParams());
  return <ResetScreen token={token} />;
}
