import { KitsScreen } from '@/components/kits/kits-screen';

export default KitsScreen;
