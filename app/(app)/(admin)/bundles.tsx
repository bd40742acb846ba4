import { BundlesScreen } from '@/components/bundles/bundles-screen';

export default BundlesScreen;
