/**
 * The one name the product gives the G-code it writes, on the web and on the command line alike.
 * RS-274 is the EIA standard for numerical-control programs (ISO 6983 is its international twin); the
 * subset written follows the NIST RS274NGC interpreter's reading of it (see gcode.ts), which the
 * product does not name separately, so that a turner meets one name.
 */
export const GCODE_STANDARD = 'RS-274';

/** What the G-code download holds, in a few words (the download buttons and `barwright help export`). */
export const GCODE_SUMMARY = `${GCODE_STANDARD} program for the passes`;
