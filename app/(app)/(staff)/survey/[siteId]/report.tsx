import { SurveyReportScreen } from '@/components/survey/report-screen';

export default SurveyReportScreen;
