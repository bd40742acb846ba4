import { WizardScreen } from '@/components/wizard/wizard-screen';

export default WizardScreen;
