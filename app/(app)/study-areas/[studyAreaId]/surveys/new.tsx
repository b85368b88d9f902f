import { NewSurveyScreen } from '@/features/surveys/NewSurveyScreen';

export default NewSurveyScreen;
