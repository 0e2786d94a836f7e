import { useLocalSearchParams } from 'expo-router';
import { readQuery } from '@/components/worksheet/permalink';
import { deferred } from '@/components/lazy/deferred';
import { useWorksheet } from '@/components/queries/worksheets';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

const WorksheetScreen = deferred('WorksheetScreen');

export default function WorksheetRoute() {
  const { name, ...query } = useLocalSearchParams<{ name: string }>();
  const worksheet = useWorksheet(name).data?.worksheet;
  usePageTitle(`${worksheet?.title ?? 'Worksheet'} — ${SITE_NAME}`, worksheet?.summary);
  return <WorksheetScreen key={name} name={name} query={readQuery(query)} />;
}
