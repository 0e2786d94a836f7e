import { SignUpScreen } from '@/components/auth/SignUpScreen';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

export default function SignUpRoute() {
  usePageTitle(`Create an account — ${SITE_NAME}`);
  return <SignUpScreen />;
}
