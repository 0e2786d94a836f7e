import { NotFoundScreen } from '@/components/screens/NotFoundScreen';

export default NotFoundScreen;
