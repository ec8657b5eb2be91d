CREATE TABLE `aircraft` (
	`id` text PRIMARY KEY NOT NULL,
	`name` text NOT NULL,
	`group_name` text,
	`certification` text NOT NULL,
	`engine_type` text NOT NULL,
	`engine_count` integer NOT NULL,
	`gear` text NOT NULL,
	`mtow_kg` real NOT NULL,
	`mlw_kg` real NOT NULL,
	`oew_kg` real NOT NULL,
	`max_payload_kg` real NOT NULL,
	`max_fuel_kg` real NOT NULL,
	`wing_area_m2` real NOT NULL,
	`wingspan_m` real NOT NULL,
	`wing_height_m` real NOT NULL,
	`tail_height_m` real NOT NULL,
	`main_gear_span_m` real NOT NULL,
	`cl_max_takeoff` real NOT NULL,
	`cl_max_landing` real NOT NULL,
	`cl_ground` real NOT NULL,
	`cd0_takeoff` real NOT NULL,
	`cd0_landing` real NOT NULL,
	`oswald` real NOT NULL,
	`engine_out_drag` real NOT NULL,
	`static_thrust_n` real,
	`bypass_ratio` real,
	`flat_rating_temp_c` real,
	`thrust_lapse` text,
	`shaft_power_w` real,
	`prop_diameter_m` real,
	`prop_efficiency` real,
	`idle_thrust_fraction` real NOT NULL,
	`rolling_friction` real NOT NULL,
	`braking_friction_dry` real NOT NULL,
	`braking_friction_wet` real NOT NULL,
	`vr_factor` real NOT NULL,
	`vlof_factor` real NOT NULL,
	`v2_factor` real NOT NULL,
	`vref_factor` real NOT NULL,
	`vmcg_mps` real,
	`rotation_time_s` real NOT NULL,
	`recognition_time_s` real NOT NULL,
	`free_roll_time_s` real NOT NULL,
	`tail_up_speed_mps` real,
	`three_point_cl` real,
	`light_aircraft_factor` real,
	`cruise_speed_mps` real,
	`cruise_altitude_m` real,
	`cruise_lift_to_drag` real,
	`cruise_hold_lift_to_drag` real,
	`cruise_tsfc_perh` real,
	`cruise_bsfc_kg_per_kwh` real,
	`cruise_prop_efficiency` real,
	`cruise_taxi_fuel_kg` real,
	`cruise_contingency_fraction` real,
	`reference_takeoff_m` real,
	`reference_landing_m` real,
	`reference_table_json` text,
	CONSTRAINT "aircraft_engine_count" CHECK("aircraft"."engine_count" BETWEEN 1 AND 4),
	CONSTRAINT "aircraft_masses" CHECK("aircraft"."oew_kg" < "aircraft"."mlw_kg" AND "aircraft"."mlw_kg" <= "aircraft"."mtow_kg"),
	CONSTRAINT "aircraft_cruise_complete" CHECK(("aircraft"."cruise_speed_mps" IS NULL) = ("aircraft"."cruise_altitude_m" IS NULL))
);
--> statement-breakpoint
CREATE TABLE `fleet_rows` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`scenario_id` integer NOT NULL,
	`position` integer NOT NULL,
	`aircraft_id` text NOT NULL,
	`annual_operations` real NOT NULL,
	`stage_length_km` real NOT NULL,
	`payload_kg` real NOT NULL,
	FOREIGN KEY (`scenario_id`) REFERENCES `scenarios`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`aircraft_id`) REFERENCES `aircraft`(`id`) ON UPDATE cascade ON DELETE restrict
);
--> statement-breakpoint
CREATE UNIQUE INDEX `fleet_rows_scenario_position` ON `fleet_rows` (`scenario_id`,`position`);--> statement-breakpoint
CREATE INDEX `fleet_rows_aircraft` ON `fleet_rows` (`aircraft_id`);--> statement-breakpoint
CREATE TABLE `meta` (
	`key` text PRIMARY KEY NOT NULL,
	`value` text NOT NULL
);
--> statement-breakpoint
CREATE TABLE `runway_directions` (
	`runway_id` integer NOT NULL,
	`position` integer NOT NULL,
	`designator` text NOT NULL,
	`tora_m` real NOT NULL,
	`toda_m` real NOT NULL,
	`asda_m` real NOT NULL,
	`lda_m` real NOT NULL,
	PRIMARY KEY(`runway_id`, `position`),
	FOREIGN KEY (`runway_id`) REFERENCES `runways`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE TABLE `runway_profile_points` (
	`runway_id` integer NOT NULL,
	`position` integer NOT NULL,
	`chainage_m` real NOT NULL,
	`elevation_m` real NOT NULL,
	PRIMARY KEY(`runway_id`, `position`),
	FOREIGN KEY (`runway_id`) REFERENCES `runways`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE TABLE `runways` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`site_id` integer NOT NULL,
	`position` integer NOT NULL,
	`name` text NOT NULL,
	`pavement` text NOT NULL,
	FOREIGN KEY (`site_id`) REFERENCES `sites`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `runways_site_position` ON `runways` (`site_id`,`position`);--> statement-breakpoint
CREATE TABLE `saved_results` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`study_id` integer NOT NULL,
	`input_json` text NOT NULL,
	`input_digest` text NOT NULL,
	`result_json` text NOT NULL,
	`method_version` text NOT NULL,
	`created_at` text NOT NULL,
	FOREIGN KEY (`study_id`) REFERENCES `studies`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `saved_results_study_created` ON `saved_results` (`study_id`,`created_at`);--> statement-breakpoint
CREATE TABLE `scenarios` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`study_id` integer NOT NULL,
	`position` integer NOT NULL,
	`name` text NOT NULL,
	FOREIGN KEY (`study_id`) REFERENCES `studies`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `scenarios_study_position` ON `scenarios` (`study_id`,`position`);--> statement-breakpoint
CREATE TABLE `site_climate_months` (
	`site_id` integer NOT NULL,
	`month` integer NOT NULL,
	`mean_max_c` real NOT NULL,
	`mean_min_c` real,
	`mean_c` real,
	PRIMARY KEY(`site_id`, `month`),
	FOREIGN KEY (`site_id`) REFERENCES `sites`(`id`) ON UPDATE no action ON DELETE cascade,
	CONSTRAINT "site_climate_month" CHECK("site_climate_months"."month" BETWEEN 1 AND 12)
);
--> statement-breakpoint
CREATE TABLE `sites` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`name` text NOT NULL,
	`elevation_m` real NOT NULL,
	`design_temperature_c` real,
	`climate_source` text,
	`climate_years` real
);
--> statement-breakpoint
CREATE TABLE `studies` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`name` text NOT NULL,
	`site_id` integer NOT NULL,
	`regular_use_threshold_annual_ops` real NOT NULL,
	`rounding_increment_m` real NOT NULL,
	`surface` text NOT NULL,
	`method` text NOT NULL,
	`units` text NOT NULL,
	`reserve_policy` text NOT NULL,
	`reserve_alternate_km` real,
	`reserve_holding_min` real,
	`reserve_contingency_fraction` real,
	`passenger_mass_kg` real NOT NULL,
	`landing_temperature` text NOT NULL,
	FOREIGN KEY (`site_id`) REFERENCES `sites`(`id`) ON UPDATE no action ON DELETE restrict
);
--> statement-breakpoint
CREATE INDEX `studies_site` ON `studies` (`site_id`);