import { PlaceholderScreen } from '@/components/screens/PlaceholderScreen';

export default function DeskRoute() {
  return <PlaceholderScreen section="desk" />;
}
