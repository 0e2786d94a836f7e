import { PlaceholderScreen } from '@/components/screens/PlaceholderScreen';

export default function CheckRoute() {
  return <PlaceholderScreen section="check" />;
}
