import { SurveyScreen } from '@/features/surveys/SurveyScreen';

export default SurveyScreen;
