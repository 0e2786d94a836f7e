import { QueueScreen } from '@/components/queue/QueueScreen';

export default QueueScreen;
