ALTER TABLE "user" ADD CONSTRAINT "user_role_known" CHECK ("user"."role" is null or "user"."role" in ('buyer', 'seller', 'admin'));--> statement-breakpoint
ALTER TABLE "species" ADD CONSTRAINT "species_rate_in_range" CHECK ("species"."rate_per_board_foot_cents" >= 0 and "species"."rate_per_board_foot_cents" <= 100000000);--> statement-breakpoint
ALTER TABLE "species" ADD CONSTRAINT "species_radial_in_range" CHECK ("species"."radial_coefficient" > 0 and "species"."radial_coefficient" <= 0.05);--> statement-breakpoint
ALTER TABLE "species" ADD CONSTRAINT "species_tangential_in_range" CHECK ("species"."tangential_coefficient" > 0 and "species"."tangential_coefficient" <= 0.05);--> statement-breakpoint
ALTER TABLE "species" ADD CONSTRAINT "species_basic_sg_in_range" CHECK ("species"."basic_specific_gravity" > 0 and "species"."basic_specific_gravity" <= 1.54);--> statement-breakpoint
ALTER TABLE "species" ADD CONSTRAINT "species_sg12_in_range" CHECK ("species"."specific_gravity_12" > 0 and "species"."specific_gravity_12" <= 1.54);--> statement-breakpoint
ALTER TABLE "logs" ADD CONSTRAINT "logs_sawing_method_known" CHECK ("logs"."sawing_method" in ('flatsawn', 'quartersawn', 'through-and-through', 'live-edge-slabbing'));--> statement-breakpoint
ALTER TABLE "logs" ADD CONSTRAINT "logs_length_in_range" CHECK ("logs"."length_in" > 0 and "logs"."length_in" <= 1200);--> statement-breakpoint
ALTER TABLE "logs" ADD CONSTRAINT "logs_butt_in_range" CHECK ("logs"."butt_diameter_in" > 0 and "logs"."butt_diameter_in" <= 240);--> statement-breakpoint
ALTER TABLE "logs" ADD CONSTRAINT "logs_top_in_range" CHECK ("logs"."top_diameter_in" > 0 and "logs"."top_diameter_in" <= 240);--> statement-breakpoint
ALTER TABLE "logs" ADD CONSTRAINT "logs_top_not_wider_than_butt" CHECK ("logs"."top_diameter_in" <= "logs"."butt_diameter_in");--> statement-breakpoint
ALTER TABLE "logs" ADD CONSTRAINT "logs_felled_on_sane" CHECK ("logs"."felled_on" is null or "logs"."felled_on" >= '1900-01-01');--> statement-breakpoint
ALTER TABLE "logs" ADD CONSTRAINT "logs_milled_on_sane" CHECK ("logs"."milled_on" is null or "logs"."milled_on" >= '1900-01-01');--> statement-breakpoint
ALTER TABLE "logs" ADD CONSTRAINT "logs_milled_after_felled" CHECK ("logs"."felled_on" is null or "logs"."milled_on" is null or "logs"."milled_on" >= "logs"."felled_on");--> statement-breakpoint
ALTER TABLE "slabs" ADD CONSTRAINT "slabs_status_known" CHECK ("slabs"."status" in ('drying', 'ready', 'listed', 'held', 'sold', 'picked-up', 'withdrawn'));--> statement-breakpoint
ALTER TABLE "slabs" ADD CONSTRAINT "slabs_drying_state_known" CHECK ("slabs"."drying_state" in ('green', 'air-drying', 'air-dry', 'shop-dry'));--> statement-breakpoint
ALTER TABLE "slabs" ADD CONSTRAINT "slabs_live_edge_known" CHECK ("slabs"."live_edge" in ('none', 'one', 'both'));--> statement-breakpoint
ALTER TABLE "slabs" ADD CONSTRAINT "slabs_sequence_in_range" CHECK ("slabs"."sequence_in_log" >= 1 and "slabs"."sequence_in_log" <= 999);--> statement-breakpoint
ALTER TABLE "slabs" ADD CONSTRAINT "slabs_thickness_in_range" CHECK ("slabs"."thickness_in" > 0 and "slabs"."thickness_in" <= 48);--> statement-breakpoint
ALTER TABLE "slabs" ADD CONSTRAINT "slabs_width_in_range" CHECK ("slabs"."width_in" > 0 and "slabs"."width_in" <= 240);--> statement-breakpoint
ALTER TABLE "slabs" ADD CONSTRAINT "slabs_widths_measured" CHECK (jsonb_typeof("slabs"."widths_in") = 'array' and jsonb_array_length("slabs"."widths_in") between 1 and 8);--> statement-breakpoint
ALTER TABLE "slabs" ADD CONSTRAINT "slabs_length_in_range" CHECK ("slabs"."length_in" > 0 and "slabs"."length_in" <= 1200);--> statement-breakpoint
ALTER TABLE "slabs" ADD CONSTRAINT "slabs_board_feet_in_range" CHECK ("slabs"."board_feet" > 0 and "slabs"."board_feet" <= 96000);--> statement-breakpoint
ALTER TABLE "slabs" ADD CONSTRAINT "slabs_price_in_range" CHECK ("slabs"."price_cents" >= 0 and "slabs"."price_cents" <= 100000000);--> statement-breakpoint
ALTER TABLE "slabs" ADD CONSTRAINT "slabs_price_override_in_range" CHECK ("slabs"."price_override_cents" is null or ("slabs"."price_override_cents" >= 0 and "slabs"."price_override_cents" <= 100000000 and "slabs"."price_override_cents" > 0));--> statement-breakpoint
ALTER TABLE "slab_photos" ADD CONSTRAINT "slab_photos_width_in_range" CHECK ("slab_photos"."width" > 0 and "slab_photos"."width" <= 100000);--> statement-breakpoint
ALTER TABLE "slab_photos" ADD CONSTRAINT "slab_photos_height_in_range" CHECK ("slab_photos"."height" > 0 and "slab_photos"."height" <= 100000);--> statement-breakpoint
ALTER TABLE "slab_photos" ADD CONSTRAINT "slab_photos_position_in_range" CHECK ("slab_photos"."position" >= 0 and "slab_photos"."position" <= 10000);--> statement-breakpoint
ALTER TABLE "moisture_readings" ADD CONSTRAINT "moisture_mc_in_range" CHECK ("moisture_readings"."mc_percent" > 0 and "moisture_readings"."mc_percent" <= 336);--> statement-breakpoint
ALTER TABLE "moisture_readings" ADD CONSTRAINT "moisture_meter_known" CHECK ("moisture_readings"."meter_kind" in ('pin', 'pinless', 'oven-dry'));--> statement-breakpoint
ALTER TABLE "moisture_readings" ADD CONSTRAINT "moisture_measured_on_sane" CHECK ("moisture_readings"."measured_on" >= '1900-01-01');--> statement-breakpoint
ALTER TABLE "moisture_readings" ADD CONSTRAINT "moisture_depth_in_range" CHECK ("moisture_readings"."depth_in" is null or ("moisture_readings"."depth_in" > 0 and "moisture_readings"."depth_in" <= 12));--> statement-breakpoint
ALTER TABLE "moisture_readings" ADD CONSTRAINT "moisture_ambient_rh_in_range" CHECK ("moisture_readings"."ambient_rh_percent" is null or ("moisture_readings"."ambient_rh_percent" >= 0 and "moisture_readings"."ambient_rh_percent" <= 100));--> statement-breakpoint
ALTER TABLE "moisture_readings" ADD CONSTRAINT "moisture_ambient_temp_in_range" CHECK ("moisture_readings"."ambient_temp_f" is null or ("moisture_readings"."ambient_temp_f" >= -60 and "moisture_readings"."ambient_temp_f" <= 140));--> statement-breakpoint
ALTER TABLE "figure_kinds" ADD CONSTRAINT "figure_kinds_multiplier_in_range" CHECK ("figure_kinds"."premium_multiplier" > 0 and "figure_kinds"."premium_multiplier" <= 10);--> statement-breakpoint
ALTER TABLE "mill_settings" ADD CONSTRAINT "mill_settings_one_row" CHECK ("mill_settings"."id" = 1);--> statement-breakpoint
ALTER TABLE "mill_settings" ADD CONSTRAINT "mill_settings_hold_hours_in_range" CHECK ("mill_settings"."hold_hours" > 0 and "mill_settings"."hold_hours" <= 8760);--> statement-breakpoint
ALTER TABLE "mill_settings" ADD CONSTRAINT "mill_settings_target_mc_in_range" CHECK ("mill_settings"."target_mc_percent" > 0 and "mill_settings"."target_mc_percent" <= 30);--> statement-breakpoint
ALTER TABLE "mill_settings" ADD CONSTRAINT "mill_settings_minimum_charge_in_range" CHECK ("mill_settings"."minimum_charge_cents" >= 0 and "mill_settings"."minimum_charge_cents" <= 100000000);--> statement-breakpoint
ALTER TABLE "mill_settings" ADD CONSTRAINT "mill_settings_thick_min_in_range" CHECK ("mill_settings"."thick_premium_min_in" > 0 and "mill_settings"."thick_premium_min_in" <= 48);--> statement-breakpoint
ALTER TABLE "mill_settings" ADD CONSTRAINT "mill_settings_thick_multiplier_in_range" CHECK ("mill_settings"."thick_premium_multiplier" > 0 and "mill_settings"."thick_premium_multiplier" <= 10);--> statement-breakpoint
ALTER TABLE "mill_settings" ADD CONSTRAINT "mill_settings_flattening_in_range" CHECK ("mill_settings"."flattening_cents_per_sq_ft" >= 0 and "mill_settings"."flattening_cents_per_sq_ft" <= 100000000);--> statement-breakpoint
ALTER TABLE "mill_settings" ADD CONSTRAINT "mill_settings_no_show_rule_known" CHECK ("mill_settings"."no_show_rule" in ('keep', 'release-and-refund'));--> statement-breakpoint
ALTER TABLE "mill_settings" ADD CONSTRAINT "mill_settings_reading_age_in_range" CHECK ("mill_settings"."max_reading_age_days" > 0 and "mill_settings"."max_reading_age_days" <= 3650);--> statement-breakpoint
ALTER TABLE "holds" ADD CONSTRAINT "holds_status_known" CHECK ("holds"."status" in ('active', 'released', 'expired', 'converted'));--> statement-breakpoint
ALTER TABLE "holds" ADD CONSTRAINT "holds_expire_after_start" CHECK ("holds"."expires_at" > "holds"."created_at");--> statement-breakpoint
ALTER TABLE "holds" ADD CONSTRAINT "holds_closed_when_ended" CHECK (("holds"."status" = 'active') = ("holds"."closed_at" is null));--> statement-breakpoint
ALTER TABLE "pickup_windows" ADD CONSTRAINT "pickup_windows_weekday_known" CHECK ("pickup_windows"."weekday" >= 0 and "pickup_windows"."weekday" <= 6);--> statement-breakpoint
ALTER TABLE "pickup_windows" ADD CONSTRAINT "pickup_windows_times_are_clock" CHECK ("pickup_windows"."starts_at" ~ '^([01][0-9]|2[0-3]):[0-5][0-9]$' and "pickup_windows"."ends_at" ~ '^([01][0-9]|2[0-3]):[0-5][0-9]$');--> statement-breakpoint
ALTER TABLE "pickup_windows" ADD CONSTRAINT "pickup_windows_end_after_start" CHECK ("pickup_windows"."ends_at" > "pickup_windows"."starts_at");--> statement-breakpoint
ALTER TABLE "pickup_windows" ADD CONSTRAINT "pickup_windows_capacity_in_range" CHECK ("pickup_windows"."capacity" > 0 and "pickup_windows"."capacity" <= 1000);--> statement-breakpoint
ALTER TABLE "order_lines" ADD CONSTRAINT "order_lines_status_known" CHECK ("order_lines"."status" in ('pending', 'sold', 'void', 'refunded'));--> statement-breakpoint
ALTER TABLE "order_lines" ADD CONSTRAINT "order_lines_slab_cents_in_range" CHECK ("order_lines"."slab_cents" >= 0 and "order_lines"."slab_cents" <= 100000000);--> statement-breakpoint
ALTER TABLE "order_lines" ADD CONSTRAINT "order_lines_services_cents_in_range" CHECK ("order_lines"."services_cents" >= 0 and "order_lines"."services_cents" <= 100000000);--> statement-breakpoint
ALTER TABLE "order_lines" ADD CONSTRAINT "order_lines_total_adds_up" CHECK ("order_lines"."total_cents" = "order_lines"."slab_cents" + "order_lines"."services_cents");--> statement-breakpoint
ALTER TABLE "order_lines" ADD CONSTRAINT "order_lines_board_feet_in_range" CHECK ("order_lines"."board_feet" > 0 and "order_lines"."board_feet" <= 96000);--> statement-breakpoint
ALTER TABLE "order_lines" ADD CONSTRAINT "order_lines_weight_in_range" CHECK ("order_lines"."weight_lb" > 0 and "order_lines"."weight_lb" <= 100000);--> statement-breakpoint
ALTER TABLE "order_lines" ADD CONSTRAINT "order_lines_length_in_range" CHECK ("order_lines"."length_in" > 0 and "order_lines"."length_in" <= 1200);--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_status_known" CHECK ("orders"."status" in ('pending-payment', 'paid', 'picked-up', 'no-show', 'refunded', 'cancelled'));--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_slabs_cents_in_range" CHECK ("orders"."slabs_cents" >= 0 and "orders"."slabs_cents" <= 100000000);--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_services_cents_in_range" CHECK ("orders"."services_cents" >= 0 and "orders"."services_cents" <= 100000000);--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_total_adds_up" CHECK ("orders"."total_cents" = "orders"."slabs_cents" + "orders"."services_cents");--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_refunded_within_total" CHECK ("orders"."refunded_cents" >= 0 and "orders"."refunded_cents" <= "orders"."total_cents");--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_weight_in_range" CHECK ("orders"."total_weight_lb" > 0 and "orders"."total_weight_lb" <= 100000);--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_longest_in_range" CHECK ("orders"."longest_slab_in" > 0 and "orders"."longest_slab_in" <= 1200);--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_kind_known" CHECK ("payments"."kind" in ('charge', 'refund'));--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_status_known" CHECK ("payments"."status" in ('pending', 'succeeded', 'failed', 'refunded'));--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_amount_in_range" CHECK ("payments"."amount_cents" >= 0 and "payments"."amount_cents" <= 100000000);--> statement-breakpoint
ALTER TABLE "email_outbox" ADD CONSTRAINT "email_outbox_status_known" CHECK ("email_outbox"."status" in ('pending', 'sent', 'failed'));--> statement-breakpoint
ALTER TABLE "email_outbox" ADD CONSTRAINT "email_outbox_attempts_in_range" CHECK ("email_outbox"."attempts" >= 0 and "email_outbox"."attempts" <= 1000);