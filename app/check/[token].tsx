import { useLocalSearchParams } from 'expo-router';
import { deferred } from '@/components/lazy/deferred';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

const SavedClaimCheckScreen = deferred('SavedClaimCheckScreen');

export default function SavedClaimCheckRoute() {
  usePageTitle(`Saved claim check — ${SITE_NAME}`);
  const { token } = useLocalSearchParams<{ token: string }>();
  return <SavedClaimCheckScreen key={token} token={token} />;
}
