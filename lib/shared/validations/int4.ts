/**
 * The largest value a PostgreSQL `integer` column holds. Counts that are stored (revision
 * numbers, increments) are bounded here, so 3e9 is a clear 400 instead of an overflow (500).
 */
export const INT4_MAX = 2_147_483_647;
