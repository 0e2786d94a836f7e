import { useLocalSearchParams } from 'expo-router';
import { VerifyScreen } from '@/components/auth/VerifyScreen';
import { readQuery } from '@/components/worksheet/permalink';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

export default function VerifyRoute() {
  usePageTitle(`Verify your e-mail address — ${SITE_NAME}`);
  const { token } = readQuery(useLocalSearchParams());
  return <VerifyScreen token={token} />;
}
