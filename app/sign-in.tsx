import { useLocalSearchParams } from 'expo-router';
import { deferred } from '@/components/lazy/deferred';
import { readQuery } from '@/components/worksheet/permalink';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

const SignInScreen = deferred('SignInScreen');

export default function SignInRoute() {
  usePageTitle(`Sign in — ${SITE_NAME}`);
  const { next, email } = readQuery(useLocalSearchParams());
  return <SignInScreen next={next} email={email} />;
}
