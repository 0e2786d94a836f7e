import { CheckListScreen } from '@/components/checks/CheckListScreen';

export default CheckListScreen;
