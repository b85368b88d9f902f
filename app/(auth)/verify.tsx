import { VerifyScreen } from '@/features/auth/VerifyScreen';

export default VerifyScreen;
