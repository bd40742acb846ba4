import { SurveySitePickerScreen } from '@/components/survey/site-picker-screen';

export default SurveySitePickerScreen;
