import { z } from 'zod';
import { UNIT_SYSTEMS, type UnitSystem } from './wood/format';

/** A signed-in person's display choices, kept on their account. */
export const preferencesSchema = z.object({
  units: z.enum(UNIT_SYSTEMS, { error: 'Choose inches and pounds, or millimetres and kilograms' }),
}).strict();
export type PreferencesInput = z.infer<typeof preferencesSchema>;

/** `units` is null until the person chooses; the browser's own choice applies meanwhile. */
export type Preferences = { units: UnitSystem | null };
