import { useLocalSearchParams } from 'expo-router';
import { readQuery } from '@/components/worksheet/permalink';
import { WorksheetScreen } from '@/components/worksheet/WorksheetScreen';
import { useWorksheet } from '@/components/queries/worksheets';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

export default function WorksheetRoute() {
  const { name, ...query } = useLocalSearchParams<{ name: string }>();
  const worksheet = useWorksheet(name).data?.worksheet;
  usePageTitle(`${worksheet?.title ?? 'Worksheet'} — ${SITE_NAME}`, worksheet?.summary);
  return <WorksheetScreen key={name} name={name} query={readQuery(query)} />;
}
