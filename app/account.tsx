import { AccountScreen } from '@/components/account/AccountScreen';

export default AccountScreen;
