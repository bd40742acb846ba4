import { SurveyScreen } from '@/components/survey/survey-screen';

export default SurveyScreen;
