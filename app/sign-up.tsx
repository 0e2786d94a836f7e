import { deferred } from '@/components/lazy/deferred';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

const SignUpScreen = deferred('SignUpScreen');

export default function SignUpRoute() {
  usePageTitle(`Create an account — ${SITE_NAME}`);
  return <SignUpScreen />;
}
