/** The aircraft feature: catalogue pages and routes, the profile schema, catalogue import and export. */
// Leaf modules first, routes last: a route module's imports may come back to this index, and the
// schemas must be evaluated by then.
export { aircraftSchema } from './schema.js';
export {
  catalogueTransferList, commitCatalogue, commitCatalogueBulk, exportAircraftJson, importAircraftJson, packValidated,
  parseAircraftJson, type CatalogueImportResult, type ParsedCatalogue,
} from './catalogue.js';
export { aircraftRoutes, type AircraftRouteDeps } from './routes.js';
