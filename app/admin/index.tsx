import { deferred } from '@/components/lazy/deferred';

const UsersScreen = deferred('UsersScreen');

export default UsersScreen;
