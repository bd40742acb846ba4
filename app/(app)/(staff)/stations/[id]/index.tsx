import { StationScreen } from '@/components/stations/station-screen';

export default StationScreen;
