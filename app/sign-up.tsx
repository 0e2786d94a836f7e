import { SignUpScreen } from '@/components/auth/SignUpScreen';

export default SignUpScreen;
