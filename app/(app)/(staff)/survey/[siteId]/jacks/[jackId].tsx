import { JackScreen } from '@/components/survey/jack-screen';

export default JackScreen;
