/**
 * Database schema (drizzle, SQLite): the aircraft catalogue, sites with climate and runways, studies
 * with their scenarios and fleet rows, and saved results.
 *
 * Every numeric column carries its unit in its name (`mtow_kg`, `elevation_m`, `tora_m`); columns
 * without a suffix are ratios, counts or text. All values are SI, as in core. Migrations are generated
 * from this file with `npm run db:generate` into drizzle/ and applied at start-up (db/client.ts).
 *
 * Lists keep their order through a `position` column. Children of a site, runway, study or scenario
 * are deleted with their parent (ON DELETE CASCADE); an aircraft used by a fleet row and a site used by
 * a study cannot be deleted (ON DELETE RESTRICT), and the repositories name the users first.
 * See docs/storage.md.
 */
import { sql } from 'drizzle-orm';
import { check, index, integer, primaryKey, real, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';

/** Key/value facts about this database file (e.g. whether the demo has been seeded). */
export const meta = sqliteTable('meta', {
  key: text('key').primaryKey(),
  value: text('value').notNull(),
});

/** Aircraft catalogue: one row per `AircraftProfile` (core/aircraft.ts); property names follow the profile. */
export const aircraft = sqliteTable(
  'aircraft',
  {
    id: text('id').primaryKey(),
    name: text('name').notNull(),
    group: text('group_name'),
    certification: text('certification', { enum: ['transport', 'commuter', 'normal'] }).notNull(),
    engineType: text('engine_type', { enum: ['turbofan', 'turboprop', 'piston'] }).notNull(),
    engineCount: integer('engine_count').notNull(),
    gear: text('gear', { enum: ['tricycle', 'tailwheel'] }).notNull(),

    mtow_kg: real('mtow_kg').notNull(),
    mlw_kg: real('mlw_kg').notNull(),
    oew_kg: real('oew_kg').notNull(),
    maxPayload_kg: real('max_payload_kg').notNull(),
    maxFuel_kg: real('max_fuel_kg').notNull(),

    wingArea_m2: real('wing_area_m2').notNull(),
    wingspan_m: real('wingspan_m').notNull(),
    wingHeight_m: real('wing_height_m').notNull(),
    tailHeight_m: real('tail_height_m').notNull(),
    mainGearSpan_m: real('main_gear_span_m').notNull(),

    clMaxTakeoff: real('cl_max_takeoff').notNull(),
    clMaxLanding: real('cl_max_landing').notNull(),
    clGround: real('cl_ground').notNull(),
    cd0Takeoff: real('cd0_takeoff').notNull(),
    cd0Landing: real('cd0_landing').notNull(),
    oswald: real('oswald').notNull(),
    engineOutDrag: real('engine_out_drag').notNull(),

    staticThrust_N: real('static_thrust_n'),
    bypassRatio: real('bypass_ratio'),
    flatRatingTemp_c: real('flat_rating_temp_c'),
    thrustLapse: text('thrust_lapse', { enum: ['mattingly', 'bartel-young'] }),
    shaftPower_W: real('shaft_power_w'),
    propDiameter_m: real('prop_diameter_m'),
    propEfficiency: real('prop_efficiency'),
    idleThrustFraction: real('idle_thrust_fraction').notNull(),

    rollingFriction: real('rolling_friction').notNull(),
    brakingFrictionDry: real('braking_friction_dry').notNull(),
    brakingFrictionWet: real('braking_friction_wet').notNull(),

    vrFactor: real('vr_factor').notNull(),
    vlofFactor: real('vlof_factor').notNull(),
    v2Factor: real('v2_factor').notNull(),
    vrefFactor: real('vref_factor').notNull(),
    vmcg_mps: real('vmcg_mps'),

    rotationTime_s: real('rotation_time_s').notNull(),
    recognitionTime_s: real('recognition_time_s').notNull(),
    freeRollTime_s: real('free_roll_time_s').notNull(),

    tailUpSpeed_mps: real('tail_up_speed_mps'),
    threePointCl: real('three_point_cl'),
    lightAircraftFactor: real('light_aircraft_factor'),
    cd0TakeoffGearUp: real('cd0_takeoff_gear_up'),
    gearRetractionTime_s: real('gear_retraction_time_s'),
    vmca_mps: real('vmca_mps'),
    vmuFactor: real('vmu_factor'),
    flatRatingDeltaIsa_k: real('flat_rating_delta_isa_k'),
    flatRatingCornerLapse_kPerKm: real('flat_rating_corner_lapse_k_per_km'),
    propFigureOfMerit: real('prop_figure_of_merit'),
    maxBrakeEnergy_J: real('max_brake_energy_j'),
    tyreSpeedLimit_mps: real('tyre_speed_limit_mps'),
    stopActivationTime_s: real('stop_activation_time_s'),
    touchdownFactor: real('touchdown_factor'),

    /** Cruise data is present when `cruise_speed_mps` is not null. */
    cruiseSpeed_mps: real('cruise_speed_mps'),
    cruiseAltitude_m: real('cruise_altitude_m'),
    cruiseLiftToDrag: real('cruise_lift_to_drag'),
    cruiseHoldLiftToDrag: real('cruise_hold_lift_to_drag'),
    cruiseTsfc_perh: real('cruise_tsfc_perh'),
    cruiseBsfc_kgPerKwh: real('cruise_bsfc_kg_per_kwh'),
    cruisePropEfficiency: real('cruise_prop_efficiency'),
    cruiseTaxiFuel_kg: real('cruise_taxi_fuel_kg'),
    cruiseContingencyFraction: real('cruise_contingency_fraction'),
    cruiseHoldFuelFlow_kgph: real('cruise_hold_fuel_flow_kgph'),
    cruiseClimbDescentFraction: real('cruise_climb_descent_fraction'),

    referenceTakeoff_m: real('reference_takeoff_m'),
    referenceLanding_m: real('reference_landing_m'),
    /** `ReferenceTable` (mass_kg × elevation_m × temperature_c → length_m) as JSON text. */
    referenceTableJson: text('reference_table_json'),
  },
  (t) => [
    // The catalogue list pages in name order (LIMIT/OFFSET): without it every page sorts the table.
    index('aircraft_name_order').on(t.name, t.id),
    check('aircraft_engine_count', sql`${t.engineCount} BETWEEN 1 AND 4`),
    check('aircraft_masses', sql`${t.oew_kg} < ${t.mlw_kg} AND ${t.mlw_kg} <= ${t.mtow_kg}`),
    check('aircraft_cruise_complete', sql`(${t.cruiseSpeed_mps} IS NULL) = (${t.cruiseAltitude_m} IS NULL)`),
  ],
);

export const sites = sqliteTable('sites', {
  id: integer('id').primaryKey({ autoIncrement: true }),
  name: text('name').notNull(),
  elevation_m: real('elevation_m').notNull(),
  designTemperature_c: real('design_temperature_c'),
  /** Climate is present when its source is not null; its months are in `site_climate_months`. */
  climateSource: text('climate_source'),
  climateYears: real('climate_years'),
});

/** Monthly climate values of a site (one row per calendar month). */
export const siteClimateMonths = sqliteTable(
  'site_climate_months',
  {
    siteId: integer('site_id').notNull().references(() => sites.id, { onDelete: 'cascade' }),
    month: integer('month').notNull(),
    meanMax_c: real('mean_max_c').notNull(),
    meanMin_c: real('mean_min_c'),
    mean_c: real('mean_c'),
  },
  (t) => [
    primaryKey({ columns: [t.siteId, t.month] }),
    check('site_climate_month', sql`${t.month} BETWEEN 1 AND 12`),
  ],
);

export const runways = sqliteTable(
  'runways',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    siteId: integer('site_id').notNull().references(() => sites.id, { onDelete: 'cascade' }),
    position: integer('position').notNull(),
    name: text('name').notNull(),
    pavement: text('pavement', { enum: ['paved', 'grass'] }).notNull(),
  },
  (t) => [uniqueIndex('runways_site_position').on(t.siteId, t.position)],
);

/** Centreline profile points of a runway, in chainage order as entered. */
export const runwayProfilePoints = sqliteTable(
  'runway_profile_points',
  {
    runwayId: integer('runway_id').notNull().references(() => runways.id, { onDelete: 'cascade' }),
    position: integer('position').notNull(),
    chainage_m: real('chainage_m').notNull(),
    elevation_m: real('elevation_m').notNull(),
  },
  (t) => [primaryKey({ columns: [t.runwayId, t.position] })],
);

/** Takeoff/landing directions of a runway with their declared distances. */
export const runwayDirections = sqliteTable(
  'runway_directions',
  {
    runwayId: integer('runway_id').notNull().references(() => runways.id, { onDelete: 'cascade' }),
    position: integer('position').notNull(),
    designator: text('designator').notNull(),
    tora_m: real('tora_m').notNull(),
    toda_m: real('toda_m').notNull(),
    asda_m: real('asda_m').notNull(),
    lda_m: real('lda_m').notNull(),
  },
  (t) => [primaryKey({ columns: [t.runwayId, t.position] })],
);

/** A study: a site, options (core `StudyOptions`) and scenarios. */
export const studies = sqliteTable(
  'studies',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    name: text('name').notNull(),
    siteId: integer('site_id').notNull().references(() => sites.id, { onDelete: 'restrict' }),
    regularUseThreshold_annualOps: real('regular_use_threshold_annual_ops').notNull(),
    roundingIncrement_m: real('rounding_increment_m').notNull(),
    surface: text('surface').notNull(),
    method: text('method').notNull(),
    units: text('units', { enum: ['si', 'us'] }).notNull(),
    reservePolicy: text('reserve_policy').notNull(),
    reserveAlternate_km: real('reserve_alternate_km'),
    reserveHolding_min: real('reserve_holding_min'),
    reserveContingencyFraction: real('reserve_contingency_fraction'),
    passengerMass_kg: real('passenger_mass_kg').notNull(),
    landingTemperature: text('landing_temperature', { enum: ['isa', 'design'] }).notNull(),
    landingMass: text('landing_mass', { enum: ['mlw', 'route'] }).notNull().default('mlw'),
    /** Operating rule set (null: the default, 'us-121'). */
    operatingRules: text('operating_rules', { enum: ['us-121', 'us-135-eod', 'us-91', 'eu-cat'] }),
    /** Recorded reason a corrected reference length beyond 35 % may govern (null: no override). */
    referenceOverrideReason: text('reference_override_reason'),
  },
  (t) => [index('studies_site').on(t.siteId)],
);

export const scenarios = sqliteTable(
  'scenarios',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    studyId: integer('study_id').notNull().references(() => studies.id, { onDelete: 'cascade' }),
    position: integer('position').notNull(),
    name: text('name').notNull(),
  },
  (t) => [uniqueIndex('scenarios_study_position').on(t.studyId, t.position)],
);

export const fleetRows = sqliteTable(
  'fleet_rows',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    scenarioId: integer('scenario_id').notNull().references(() => scenarios.id, { onDelete: 'cascade' }),
    position: integer('position').notNull(),
    aircraftId: text('aircraft_id')
      .notNull()
      .references(() => aircraft.id, { onDelete: 'restrict', onUpdate: 'cascade' }),
    annualOperations: real('annual_operations').notNull(),
    stageLength_km: real('stage_length_km').notNull(),
    payload_kg: real('payload_kg').notNull(),
  },
  (t) => [
    uniqueIndex('fleet_rows_scenario_position').on(t.scenarioId, t.position),
    index('fleet_rows_aircraft').on(t.aircraftId),
  ],
);

/**
 * A saved result: the exact study input it was computed from (JSON), the caller's digest of that input,
 * the result snapshot (JSON), the method version and the creation time (ISO 8601, UTC).
 * Later edits to the catalogue or the study never change these rows.
 */
export const savedResults = sqliteTable(
  'saved_results',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    studyId: integer('study_id').notNull().references(() => studies.id, { onDelete: 'cascade' }),
    inputJson: text('input_json').notNull(),
    inputDigest: text('input_digest').notNull(),
    resultJson: text('result_json').notNull(),
    methodVersion: text('method_version').notNull(),
    createdAt: text('created_at').notNull(),
  },
  (t) => [index('saved_results_study_created').on(t.studyId, t.createdAt)],
);
