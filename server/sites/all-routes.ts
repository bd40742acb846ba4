// The routers of sites, their directory (CSV), kits and stations, for server/routes.ts.
export { sitesRouter } from './routes';
export { siteDirectoryRouter } from './directory-routes';
export { kitsRouter } from '../kits/routes';
export { stationsRouter } from '../stations/routes';
