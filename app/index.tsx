import { LibraryScreen } from '@/components/screens/LibraryScreen';

export default LibraryScreen;
