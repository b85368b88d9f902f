import { SurveyListScreen } from '@/features/surveys/SurveyListScreen';

export default SurveyListScreen;
