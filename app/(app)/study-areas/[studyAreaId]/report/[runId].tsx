import { RunReportScreen } from '@/features/reports/RunReportScreen';

export default RunReportScreen;
