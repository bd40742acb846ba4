// The plan loop's routers (plans, review, the office user's station), mounted together from server/routes.ts.
import { myStationRouter } from '../my-station/routes';
import { reviewRouter } from '../review/routes';
import { plansRouter } from './routes';

export const planRouters = [plansRouter, reviewRouter, myStationRouter];
