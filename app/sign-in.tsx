import { useLocalSearchParams } from 'expo-router';
import { SignInScreen } from '@/components/auth/SignInScreen';
import { readQuery } from '@/components/worksheet/permalink';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

export default function SignInRoute() {
  usePageTitle(`Sign in — ${SITE_NAME}`);
  const { next, email } = readQuery(useLocalSearchParams());
  return <SignInScreen next={next} email={email} />;
}
