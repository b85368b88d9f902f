import { RunScreen } from '@/features/runs/RunScreen';

export default RunScreen;
