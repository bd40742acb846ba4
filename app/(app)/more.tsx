import { MoreScreen } from '@/components/shell/more-screen';

export default MoreScreen;
