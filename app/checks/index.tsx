import { deferred } from '@/components/lazy/deferred';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

const CheckListScreen = deferred('CheckListScreen');

export default function CheckListRoute() {
  usePageTitle(`Check kit — ${SITE_NAME}`, 'The check kit: the standard physics checks and worksheets, run on your own figures.');
  return <CheckListScreen />;
}
