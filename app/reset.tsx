import { useLocalSearchParams } from 'expo-router';
import { deferred } from '@/components/lazy/deferred';
import { readQuery } from '@/components/worksheet/permalink';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

const ResetScreen = deferred('ResetScreen');

export default function ResetRoute() {
  usePageTitle(`New password — ${SITE_NAME}`);
  const { token } = readQuery(useLocalSearchParams());
  return <ResetScreen token={token} />;
}
