/**
 * The public face of the computation core: exactly the names the server, the templates, the database
 * layer and the scripts use (test/arch/imports.test.ts checks both directions: they import core only
 * from here, and every name here is used by one of them). Everything else in core is internal: the
 * models, solvers and helpers behind these names. Tests and benchmarks, which exercise the internals,
 * import them from their own modules (e.g. `core/takeoff/model.js`).
 */

// Errors and range text
export {
  ConvergenceError, domainProblemText, formatValue, InputDomainError, type DomainRange
} from './errors.js';

// Warnings as data (code, sentence, quantities) and their rendering
export { notice, noticeJson, noticeText, plainFormat, type Notice, type QuantityFormat } from './notices.js';

// Input ranges shared by forms, schemas and validation
export {
  DESIGN_TEMPERATURE_RANGE, IDENTIFIER_PATTERN, IDENTIFIER_RULE, REFERENCE_LENGTH_RANGE,
  REFERENCE_TABLE_ELEVATION_RANGE, REFERENCE_TABLE_LENGTH_RANGE, REFERENCE_TABLE_MASS_RANGE,
  REFERENCE_TABLE_TEMPERATURE_RANGE, RUNWAY_CHAINAGE_RANGE, RUNWAY_POINT_ELEVATION_RANGE,
  SITE_ELEVATION_RANGE
} from './fields.js';

// Field tables of site, climate, runway, fleet and study options
export {
  CLIMATE_FIELDS, DIRECTION_FIELDS, FLEET_FIELDS, inputField, MONTHLY_FIELDS, optionFieldByForm,
  PROFILE_POINT_FIELDS, RESERVE_POLICIES, siRangeOf, fieldInputText, SITE_FIELDS, STUDY_METHODS, STUDY_OPTION_FIELDS,
  type InputFieldSpec, type OptionFieldSpec
} from './studyFields.js';

// Display units
export { displayInputValue, displayLimit, unitOf, type DisplayKind, type UnitSystem } from './units.js';

// Aircraft profile, its field table and validation
export {
  AIRCRAFT_FIELDS, CERTIFICATION_BASES, CRUISE_FIELDS, ENGINE_TYPES, GEAR_LAYOUTS, THRUST_LAPSE_MODELS,
  validateAircraft, type AircraftProfile, type CruiseData, type EngineType, type FieldGroup,
  type FieldSpec, type ReferenceLengths, type ReferenceTable
} from './aircraft.js';

// The aeroplane reference field length (planning figure first)
export { aeroplaneReferenceFieldLength } from './plausibility.js';

// Runway surfaces
export { SURFACE_LABELS, SURFACES, type Surface } from './surface.js';

// Site climate: design temperature and station-file readers
export {
  checkDerivedDesignTemperature, ClimateFileError, climateFromDaily, designTemperatureFromMonthly,
  monthName, readGhcnDailyCsv, readMonthlyNormalsCsv, readStationDailyCsv, type DailyFileTemperatureUnit
} from './climate/index.js';

// Runway profile and declared distances
export {
  analyseRunwayProfile, checkProfileSlopes, checkRunwayDeclaredDistances, type ProfilePoint,
  type RunwayDirectionInput
} from './runway.js';

// Operating rule sets
export {
  DEFAULT_OPERATING_RULES, OPERATING_RULE_SET_INFO, OPERATING_RULE_SETS, type OperatingRuleSet
} from './operatingRules.js';

// Landing
export { analyseLanding, LANDING_RULE_LABELS, referenceLandingSpeed } from './landing.js';

// Aircraft classification
export { classifyAircraft } from './classify.js';

// Takeoff
export {
  analyseTakeoff, climbCappedTakeoff, TAKEOFF_GOVERNING_LABELS, TAKEOFF_INPUT_RANGES
} from './takeoff/index.js';

// The planning caution every page and report carries
export { CAUTION_TEXT, CAUTION_TITLE } from './caution.js';

// Study input and result types
export {
  type FleetRowInput, type MonthlyClimate, type ReservePolicyName, type RowResult, type RunwayInput,
  type ScenarioInput, type ScenarioResult, type SiteClimate, type SiteInput, type StudyInput,
  type StudyMethod, type StudyOptions, type StudyResult
} from './study/types.js';

// Chart model
export { type ChartModel } from './report/chart.js';

// The study engine
export {
  runStudy, siteConditions, siteDesignTemperature, STUDY_METHOD_VERSION, validateStudy, type ValidStudyInput
} from './study/run.js';

// Study charts (from the saved result)
export { studyCharts } from './report/charts.js';

// What-if
export { whatIf, type WhatIfConditions, type WhatIfInput, type WhatIfOutcome } from './whatif.js';

// Site charts
export { climateChart, runwayProfileChart } from './report/siteCharts.js';

// Report model (the results page and the appendix)
export {
  buildAppendixModel, componentSections, type AppendixModel, type Block, type Cell, type Column,
  type ReportSection, type Row, type ValueKind
} from './report/model.js';
