import { deferred } from '@/components/lazy/deferred';

const DeskScreen = deferred('DeskScreen');

export default DeskScreen;
