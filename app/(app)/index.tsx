import { StudyAreaListScreen } from '@/features/studyAreas/StudyAreaListScreen';

export default StudyAreaListScreen;
