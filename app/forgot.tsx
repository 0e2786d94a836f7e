import { deferred } from '@/components/lazy/deferred';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

const ForgotScreen = deferred('ForgotScreen');

export default function ForgotRoute() {
  usePageTitle(`Forgotten password — ${SITE_NAME}`);
  return <ForgotScreen />;
}
