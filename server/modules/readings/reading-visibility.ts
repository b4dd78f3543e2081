import { ne } from 'drizzle-orm';
import { moistureReadings } from '../../db/schema/index';

/**
 * Readings someone stands behind: in line with the slab's previous reading, or confirmed by the person
 * who took it. Buyers' views (moisture history, latest MC, weight) and the drying state use only these;
 * an unconfirmed reading stays in the yard's list.
 */
export const vouchedFor = ne(moistureReadings.review, 'unconfirmed');
