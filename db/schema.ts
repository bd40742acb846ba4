// Every table, for Drizzle and drizzle-kit. Each feature keeps its tables in its own module.
export * from './auth-schema';
export * from './people';
export * from './sites';
export * from './plans';
export * from './audit';
export * from './bundles';
export * from './survey';
