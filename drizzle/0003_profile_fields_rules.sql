ALTER TABLE `aircraft` ADD `cd0_takeoff_gear_up` real;--> statement-breakpoint
ALTER TABLE `aircraft` ADD `gear_retraction_time_s` real;--> statement-breakpoint
ALTER TABLE `aircraft` ADD `vmca_mps` real;--> statement-breakpoint
ALTER TABLE `aircraft` ADD `vmu_factor` real;--> statement-breakpoint
ALTER TABLE `aircraft` ADD `flat_rating_delta_isa_k` real;--> statement-breakpoint
ALTER TABLE `aircraft` ADD `flat_rating_corner_lapse_k_per_km` real;--> statement-breakpoint
ALTER TABLE `aircraft` ADD `prop_figure_of_merit` real;--> statement-breakpoint
ALTER TABLE `aircraft` ADD `max_brake_energy_j` real;--> statement-breakpoint
ALTER TABLE `aircraft` ADD `tyre_speed_limit_mps` real;--> statement-breakpoint
ALTER TABLE `aircraft` ADD `stop_activation_time_s` real;--> statement-breakpoint
ALTER TABLE `aircraft` ADD `touchdown_factor` real;--> statement-breakpoint
ALTER TABLE `aircraft` ADD `cruise_hold_fuel_flow_kgph` real;--> statement-breakpoint
ALTER TABLE `aircraft` ADD `cruise_climb_descent_fraction` real;--> statement-breakpoint
ALTER TABLE `studies` ADD `operating_rules` text;