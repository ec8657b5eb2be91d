/** The studies feature: study pages and routes, the study file, the saved result and its exports. */
// Leaf modules first, routes last: a route module's imports may come back to this index, and the
// schemas must be evaluated by then.
export { StudyService } from './state.js';
export { resultsCsv } from './resultsCsv.js';
export { canonicalJson, inputDigest, parseStudyDocument, problemFromDomainError, studyOutput, type StudyOutput } from './document.js';
export { fleetRowSchema, optionsSchema, scenarioSchema, studyFileSchema, studyInputOf, type StudyFile } from './schema.js';
export { studyRoutes, type StudyRouteDeps } from './routes.js';
export { reportRoutes, type ReportRouteDeps } from './report.js';
