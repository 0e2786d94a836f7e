import { AccountScreen } from '@/components/account/AccountScreen';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

export default function AccountRoute() {
  usePageTitle(`Account — ${SITE_NAME}`);
  return <AccountScreen />;
}
