import { deferred } from '@/components/lazy/deferred';

const SynonymsScreen = deferred('SynonymsScreen');

export default SynonymsScreen;
