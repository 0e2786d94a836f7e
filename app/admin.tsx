import { PlaceholderScreen } from '@/components/screens/PlaceholderScreen';

export default function AdminRoute() {
  return <PlaceholderScreen section="admin" />;
}
