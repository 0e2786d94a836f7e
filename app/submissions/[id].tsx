import { useLocalSearchParams } from 'expo-router';
import { deferred } from '@/components/lazy/deferred';
import { SITE_NAME, usePageTitle } from '@/components/ui/usePageTitle';

const SubmissionScreen = deferred('SubmissionScreen');

export default function SubmissionRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  usePageTitle(`Submission ${id} — ${SITE_NAME}`);
  return <SubmissionScreen key={id} id={Number(id)} />;
}
