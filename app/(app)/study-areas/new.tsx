import { CreateStudyAreaScreen } from '@/features/studyAreas/CreateStudyAreaScreen';

export default CreateStudyAreaScreen;
