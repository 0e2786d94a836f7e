import { useLocalSearchParams } from 'expo-router';
import { SubmissionScreen } from '@/components/submissions/SubmissionScreen';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

export default function SubmissionRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  usePageTitle(`Submission ${id} — ${SITE_NAME}`);
  return <SubmissionScreen key={id} id={Number(id)} />;
}
