/**
 * The names a calculation may use. Kept apart from expression.ts so that
 * code checking text (links, fields) can know them without loading the
 * calculator.
 */

/** Constants a calculation may use. */
export const EXPRESSION_CONSTANTS: readonly string[] = ['pi', 'e', 'tau'];
/** Functions a calculation may call (mathjs meanings: log is natural). */
export const EXPRESSION_FUNCTIONS: readonly string[] = [
  'sqrt', 'cbrt', 'abs', 'exp', 'log', 'log10', 'sin', 'cos', 'tan', 'atan', 'min', 'max', 'hypot',
];
