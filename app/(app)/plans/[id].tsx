import { PlanScreen } from '@/components/plans/plan-screen';

export default PlanScreen;
