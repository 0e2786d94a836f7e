import { UsersScreen } from '@/components/admin/UsersScreen';

export default UsersScreen;
