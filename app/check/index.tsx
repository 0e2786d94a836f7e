import { useLocalSearchParams } from 'expo-router';
import { ClaimCheckScreen } from '@/components/claims/ClaimCheckScreen';

export default function ClaimCheckRoute() {
  // `?from=<token>`: a saved check opened to be re-run ("Open in the claim check").
  const { from } = useLocalSearchParams<{ from?: string }>();
  return <ClaimCheckScreen key={from ?? ''} from={typeof from === 'string' && from ? from : undefined} />;
}
