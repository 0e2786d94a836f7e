import { PlaceholderScreen } from '@/components/screens/PlaceholderScreen';

export default function AccountRoute() {
  return <PlaceholderScreen section="account" />;
}
