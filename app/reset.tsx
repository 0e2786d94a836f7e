import { useLocalSearchParams } from 'expo-router';
import { ResetScreen } from '@/components/auth/ResetScreen';
import { readQuery } from '@/components/worksheet/permalink';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

export default function ResetRoute() {
  usePageTitle(`New password — ${SITE_NAME}`);
  const { token } = readQuery(useLocalSearchParams());
  return <ResetScreen token={token} />;
}
