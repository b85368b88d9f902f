import { AdminScreen } from '@/features/admin/AdminScreen';

export default AdminScreen;
