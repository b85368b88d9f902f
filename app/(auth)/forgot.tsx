import { ForgotScreen } from '@/features/auth/ForgotScreen';

export default ForgotScreen;
