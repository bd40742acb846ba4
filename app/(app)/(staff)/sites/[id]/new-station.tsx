import { NewStationScreen } from '@/components/wizard/new-station-screen';

export default NewStationScreen;
