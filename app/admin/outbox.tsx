import { deferred } from '@/components/lazy/deferred';

const OutboxScreen = deferred('OutboxScreen');

export default OutboxScreen;
