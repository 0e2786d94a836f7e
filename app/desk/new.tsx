import { NewEntryScreen } from '@/components/desk/DraftScreen';

export default NewEntryScreen;
