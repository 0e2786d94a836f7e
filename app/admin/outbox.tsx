import { OutboxScreen } from '@/components/admin/OutboxScreen';

export default OutboxScreen;
