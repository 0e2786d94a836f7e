import { ForgotScreen } from '@/components/auth/ForgotScreen';

export default ForgotScreen;
