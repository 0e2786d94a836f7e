import { useLocalSearchParams } from 'expo-router';
import { deferred } from '@/components/lazy/deferred';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

const ClaimCheckScreen = deferred('ClaimCheckScreen');

export default function ClaimCheckRoute() {
  usePageTitle(`Claim check — ${SITE_NAME}`, 'Paste a claim of an impossible machine: the library finds the objections that answer it and checks its figures.');
  // `?from=<token>`: a saved check opened to be re-run ("Open in the claim check").
  // `?resume=1`: back from signing in to save; the check kept in this tab comes back.
  const { from, resume } = useLocalSearchParams<{ from?: string; resume?: string }>();
  const token = typeof from === 'string' && from ? from : undefined;
  const back = resume === '1';
  return <ClaimCheckScreen key={`${token ?? ''}|${back ? 'resume' : ''}`} from={token} resume={back} />;
}
