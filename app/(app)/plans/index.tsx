import { PlansBoardScreen } from '@/components/plans/plans-board-screen';

export default PlansBoardScreen;
