import { SiteScreen } from '@/components/sites/site-screen';

export default SiteScreen;
