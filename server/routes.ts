// Every feature's API router, mounted under /api. A feature adds one line here.
import type { Router } from 'express';
import type { AppContext } from './context';
import { auditRouter } from './audit/routes';
import { devMailRouter } from './mail/routes';
import { peopleRouter } from './people/routes';
import { surveyRouter } from './survey/routes';
import { sitesRouter, kitsRouter, stationsRouter, siteDirectoryRouter } from './sites/all-routes';
import { planRouters } from './plans/routers';
import { bundlesRouter } from './bundles/routes';

export const featureRouters: Array<(ctx: AppContext) => Router> = [peopleRouter, auditRouter, devMailRouter, sitesRouter, siteDirectoryRouter, kitsRouter, stationsRouter, ...planRouters, surveyRouter, bundlesRouter];
