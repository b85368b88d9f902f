import { ResetScreen } from '@/features/auth/ResetScreen';

export default ResetScreen;
