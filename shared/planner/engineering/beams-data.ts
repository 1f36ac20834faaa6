/** Standard acceleration of gravity, m/s²: turns kilograms into newtons. */
export const STANDARD_GRAVITY = 9.80665; // 3rd CGPM (1901), exact by definition — from memory

/**
 * Default allowed sag: span / 300. EN 1995-1-1 Table 7.2 gives L/300 to L/500 for the instantaneous deflection
 * (w_inst) of a beam on two supports; 300 is its most lenient end, so a board that fails it certainly sags.
 */
export const DEFAULT_SPAN_LIMIT_RATIO = 300; // EN 1995-1-1 Table 7.2 (w_inst L/300–L/500)

/** The range of w_inst limits the user may choose from, as span / ratio. */
export const SPAN_LIMIT_RATIO_RANGE = { min: 300, max: 500 }; // EN 1995-1-1 Table 7.2

/** Width of the strip of top sheet checked as a beam, mm: a 1 m strip, so a load per m² becomes a load per metre. */
export const SHEET_STRIP_WIDTH_MM = 1000;
