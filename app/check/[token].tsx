import { useLocalSearchParams } from 'expo-router';
import { SavedClaimCheckScreen } from '@/components/claims/SavedClaimCheckScreen';

export default function SavedClaimCheckRoute() {
  const { token } = useLocalSearchParams<{ token: string }>();
  return <SavedClaimCheckScreen key={token} token={token} />;
}
