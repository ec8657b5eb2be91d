/** The sites feature: site and runway pages and routes, and the site part of the study file's schema. */
// Leaf modules first, routes last: a route module's imports may come back to this index, and the
// schemas must be evaluated by then.
export { climateSchema, monthlyClimateSchema, profilePointSchema, runwayDirectionSchema, runwaySchema, siteSchema } from './schema.js';
export { siteRoutes, type SiteRouteDeps } from './routes.js';
