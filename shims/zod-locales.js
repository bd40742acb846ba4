// Stands in for zod/v4/locales/index.js in the web bundle: English only (see metro.config.js).
export { default as en } from 'zod/v4/locales/en.js';
