import { deferred } from '@/components/lazy/deferred';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

const AccountScreen = deferred('AccountScreen');

export default function AccountRoute() {
  usePageTitle(`Account — ${SITE_NAME}`);
  return <AccountScreen />;
}
