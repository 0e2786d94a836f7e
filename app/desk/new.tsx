import { deferred } from '@/components/lazy/deferred';

const NewEntryScreen = deferred('NewEntryScreen');

export default NewEntryScreen;
