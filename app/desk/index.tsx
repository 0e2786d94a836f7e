import { DeskScreen } from '@/components/desk/DeskScreen';

export default DeskScreen;
