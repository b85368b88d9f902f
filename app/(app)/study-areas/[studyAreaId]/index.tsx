import { StudyAreaDetailScreen } from '@/features/studyAreas/StudyAreaDetailScreen';

export default StudyAreaDetailScreen;
