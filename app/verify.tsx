import { useLocalSearchParams } from 'expo-router';
import { deferred } from '@/components/lazy/deferred';
import { readQuery } from '@/components/worksheet/permalink';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

const VerifyScreen = deferred('VerifyScreen');

export default function VerifyRoute() {
  usePageTitle(`Verify your e-mail address — ${SITE_NAME}`);
  const { token } = readQuery(useLocalSearchParams());
  return <VerifyScreen token={token} />;
}
