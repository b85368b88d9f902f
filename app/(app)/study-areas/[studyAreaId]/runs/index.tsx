import { RunListScreen } from '@/features/runs/RunListScreen';

export default RunListScreen;
