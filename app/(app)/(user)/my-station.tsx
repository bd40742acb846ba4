import { MyStationScreen } from '@/components/my-station/my-station-screen';

export default MyStationScreen;
