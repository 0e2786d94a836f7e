import { PlaceholderScreen } from '@/components/screens/PlaceholderScreen';

export default function QueueRoute() {
  return <PlaceholderScreen section="queue" />;
}
