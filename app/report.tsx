import { deferred } from '@/components/lazy/deferred';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

const ReportSightingScreen = deferred('ReportSightingScreen');

export default function ReportRoute() {
  usePageTitle(`Report a sighting — ${SITE_NAME}`, 'Send in a claim of an impossible machine for the library’s moderators to match with its entries.');
  return <ReportSightingScreen />;
}
