/**
 * The inch in millimetres, exact by definition (the international inch of 1959). Kept in a module
 * without zod so a page that only converts lengths (the home page's bar cards) does not download zod.
 */
export const MM_PER_INCH = 25.4;
