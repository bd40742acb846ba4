import { DevMailScreen } from '@/components/mail/dev-mail-screen';

export default DevMailScreen;
