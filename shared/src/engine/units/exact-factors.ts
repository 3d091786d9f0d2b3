/**
 * SI values of the customary units the category rules are written in. Each is exact by definition
 * (NIST Special Publication 811, 2008 edition, Appendix B.8; the inch and the pound from the
 * international yard and pound agreement of 1959), so the rule limits need no unit library at
 * load: the engine's analysis path, which runs on the server's worker threads, loads no mathjs.
 * `exact-factors.spec.ts` checks every factor against mathjs's unit system.
 */
export const INCH = 0.0254; // m
export const POUND = 0.45359237; // kg
export const GRAM = 1e-3; // kg
export const CENTIMETRE = 1e-2; // m
/** One cubic centimetre (cc). */
export const CUBIC_CENTIMETRE = 1e-6; // m³
