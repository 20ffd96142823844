/**
 * The Green–Ampt solvers' shortcuts: the short-spell series of the
 * redistribution (redistribution.ts), and in the ponded solve the logarithm
 * by a series about an anchor and the Newton stop by a bound on the error
 * (green-ampt.ts). Each stands in for an exact path, which is kept: with `on`
 * false every solve takes it. Only the tests turn them off, to hold each
 * shortcut to the exact path it replaces over random storms and soils.
 */
export const shortcuts = { on: true };
