import { useLocalSearchParams } from 'expo-router';
import { CheckScreen } from '@/components/checks/CheckScreen';
import { readQuery } from '@/components/worksheet/permalink';
import { checks } from '@/shared/checks';
import { isCheckName } from '@/shared/checks/run';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

export default function CheckRoute() {
  const { name, ...query } = useLocalSearchParams<{ name: string }>();
  const check = isCheckName(name) ? checks[name] : undefined;
  usePageTitle(`${check?.title ?? 'Check'} — ${SITE_NAME}`, check?.summary);
  return <CheckScreen name={name} query={readQuery(query)} />;
}
