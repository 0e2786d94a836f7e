import { useLocalSearchParams } from 'expo-router';
import { SignInScreen } from '@/components/auth/SignInScreen';
import { readQuery } from '@/components/worksheet/permalink';

export default function SignInRoute() {
  const { next, email } = readQuery(useLocalSearchParams());
  return <SignInScreen next={next} email={email} />;
}
