import { ForgotScreen } from '@/components/auth/ForgotScreen';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

export default function ForgotRoute() {
  usePageTitle(`Forgotten password — ${SITE_NAME}`);
  return <ForgotScreen />;
}
