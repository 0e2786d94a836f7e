import { useLocalSearchParams } from 'expo-router';
import { SavedClaimCheckScreen } from '@/components/claims/SavedClaimCheckScreen';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

export default function SavedClaimCheckRoute() {
  usePageTitle(`Saved claim check — ${SITE_NAME}`);
  const { token } = useLocalSearchParams<{ token: string }>();
  return <SavedClaimCheckScreen key={token} token={token} />;
}
