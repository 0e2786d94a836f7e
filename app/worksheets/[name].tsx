import { useLocalSearchParams } from 'expo-router';
import { readQuery } from '@/components/worksheet/permalink';
import { WorksheetScreen } from '@/components/worksheet/WorksheetScreen';

export default function WorksheetRoute() {
  const { name, ...query } = useLocalSearchParams<{ name: string }>();
  return <WorksheetScreen key={name} name={name} query={readQuery(query)} />;
}
