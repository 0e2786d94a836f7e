import { CheckListScreen } from '@/components/checks/CheckListScreen';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

export default function CheckListRoute() {
  usePageTitle(`Check kit — ${SITE_NAME}`, 'The check kit: the standard physics checks and worksheets, run on your own figures.');
  return <CheckListScreen />;
}
