import { ReviewScreen } from '@/components/review/review-screen';

export default ReviewScreen;
