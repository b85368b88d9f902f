import { router } from 'expo-router';

import type { SurveyDetail } from '@/shared/schemas';

/** After a survey is created: its page, which shows the estimate (replaces the upload in history). */
export function openSurvey(survey: SurveyDetail): void {
  router.replace(`/study-areas/${survey.studyAreaId}/surveys/${survey.id}`);
}
