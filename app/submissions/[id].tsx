import { useLocalSearchParams } from 'expo-router';
import { SubmissionScreen } from '@/components/submissions/SubmissionScreen';

export default function SubmissionRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <SubmissionScreen key={id} id={Number(id)} />;
}
