/**
 * Working out a calculation typed into a quantity field ("2*47p",
 * "100p + 22p", "1/((2*pi*7.1MHz)^2 * 4.7uH)", "sqrt(4.7u/100p)").
 *
 * mathjs is loaded only here, only on demand (dynamic import), so a page
 * whose fields only ever hold plain values never downloads it.
 *
 * Defence in layers, after the mathjs "Security" guidance:
 * 1. Our own tokenizer: every number with an engineering suffix is read by the
 *    plain-quantity reader and handed to mathjs as a scope variable (with its
 *    unit when it has one); the only names allowed are a short list of
 *    constants and functions; the only other characters are + - * / ^ ( ) ,
 *    and spaces. Length is limited to MAX_QUANTITY_LENGTH characters.
 * 2. The parsed tree is checked node by node: constants, our variables,
 *    parentheses, arithmetic operators and calls of allowed functions only.
 * 3. The mathjs instance is built from a few factories only (no `all`), and
 *    `import`, `createUnit`, `evaluate`, `parse`, `compile`, `simplify`,
 *    `derivative`, `resolve`, `reviver` and friends are overridden to throw,
 *    keeping a private reference to `parse` for our own use.
 * The result must be a finite real number; with a unit it must have the
 * field's dimension, without one it is taken in the field's unit.
 */
import type { MathJsInstance, MathNode, Unit } from 'mathjs';
import { QuantityError } from './errors';
import { MAX_QUANTITY_LENGTH, commaError, looksLikeRange, parseQuantity, prepareQuantityText, readPlainQuantity, type QuantityReading } from './parse';
import { QUANTITY_UNITS, UNIT_KINDS, describeField, type QuantityUnit } from './units';

import { EXPRESSION_CONSTANTS, EXPRESSION_FUNCTIONS } from './names';
export { EXPRESSION_CONSTANTS, EXPRESSION_FUNCTIONS };
const OPERATOR_FUNCTIONS = new Set(['add', 'subtract', 'multiply', 'divide', 'pow', 'unaryMinus', 'unaryPlus']);
/** Prefix of the scope variables that carry numbers (users cannot type `_`). */
const VAR = '_q';

export interface RestrictedMath {
  /** private parse kept before the public one was disabled */
  parse: (expr: string) => MathNode;
  math: MathJsInstance;
  /** private evaluate kept before the public one was disabled (tests use it to probe the instance) */
  evaluate: (expr: string, scope?: Map<string, unknown>) => unknown;
}

let loading: Promise<RestrictedMath> | null = null;
let loaded = false;

/** True once mathjs has been imported in this realm (plain values never do). */
export function expressionEngineLoaded(): boolean {
  return loaded;
}

/** Loads mathjs on first use and builds the restricted instance (once). */
export function loadRestrictedMath(): Promise<RestrictedMath> {
  loading ??= import('mathjs').then(({
    create, parseDependencies, evaluateDependencies, unitDependencies, addDependencies, subtractDependencies, multiplyDependencies, divideDependencies, powDependencies, unaryMinusDependencies, unaryPlusDependencies, sqrtDependencies, cbrtDependencies, absDependencies, expDependencies, logDependencies, log10Dependencies, sinDependencies, cosDependencies, tanDependencies, atanDependencies, minDependencies, maxDependencies, hypotDependencies, piDependencies, eDependencies, tauDependencies,
  }) => {
    // Destructured so the bundler keeps only these factories in the lazy chunk.
    const math = create({
      parseDependencies, evaluateDependencies, unitDependencies, addDependencies, subtractDependencies, multiplyDependencies, divideDependencies, powDependencies, unaryMinusDependencies, unaryPlusDependencies, sqrtDependencies, cbrtDependencies, absDependencies, expDependencies, logDependencies, log10Dependencies, sinDependencies, cosDependencies, tanDependencies, atanDependencies, minDependencies, maxDependencies, hypotDependencies, piDependencies, eDependencies, tauDependencies,
    }) as MathJsInstance;
    const parse = math.parse.bind(math) as (expr: string) => MathNode;
    const evaluate = math.evaluate.bind(math) as (expr: string, scope?: Map<string, unknown>) => unknown;
    const disabled = (name: string) => () => {
      throw new Error(`Function ${name} is disabled`);
    };
    const names = ['import', 'createUnit', 'reviver', 'evaluate', 'parse', 'compile', 'simplify', 'simplifyConstant',
      'simplifyCore', 'derivative', 'resolve', 'rationalize', 'parser', 'chain', 'help'];
    math.import(Object.fromEntries(names.map((n) => [n, disabled(n)])), { override: true });
    loaded = true;
    return { math, parse, evaluate };
  });
  return loading;
}

interface Tokenized {
  /** expression text for mathjs, numbers replaced by `_q0`, `_q1`, … */
  source: string;
  /** the numbers read, in order */
  values: QuantityReading[];
}

const NUMBER_RKM = /(\d+)([fpnumkMGTKUNRV])(\d+)/y;
const NUMBER_PLAIN = /(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?/y;
const SUFFIX = /\s*([A-Za-z\u03a9"]+)/y;
const NAME = /[A-Za-z_][A-Za-z0-9_]*/y;

/**
 * Splits a calculation into mathjs source and the numbers in it, reading each
 * number (with its suffix) by the plain-quantity rules for a field of `field`.
 * Pure; throws QuantityError for characters, names or suffixes not allowed.
 */
export function tokenizeExpression(text: string, field: QuantityUnit): Tokenized {
  const { s: norm, original } = prepareQuantityText(text);
  const values: QuantityReading[] = [];
  let out = '';
  let depth = 0;
  let i = 0;
  while (i < norm.length) {
    const c = norm[i];
    if (/[0-9]/.test(c) || (c === '.' && /[0-9]/.test(norm[i + 1] ?? ''))) {
      let end: number;
      NUMBER_RKM.lastIndex = i;
      const rkm = NUMBER_RKM.exec(norm);
      if (rkm) {
        end = NUMBER_RKM.lastIndex;
      } else {
        NUMBER_PLAIN.lastIndex = i;
        NUMBER_PLAIN.exec(norm);
        end = NUMBER_PLAIN.lastIndex;
      }
      SUFFIX.lastIndex = end;
      const suf = SUFFIX.exec(norm);
      if (suf) {
        const letters = suf[1];
        const after = norm.slice(SUFFIX.lastIndex);
        const isName = EXPRESSION_CONSTANTS.includes(letters) || (EXPRESSION_FUNCTIONS.includes(letters) && /^\s*\(/.test(after));
        if (!isName) end = SUFFIX.lastIndex;
      }
      const piece = norm.slice(i, end);
      const { value, unit } = readPlainQuantity(piece, field, original.slice(i, end), text);
      values.push({ value, unit });
      out += ` ${VAR}${values.length - 1} `;
      i = end;
      continue;
    }
    if (c === 'π') {
      out += ' pi ';
      i++;
      continue;
    }
    if (/[A-Za-z_]/.test(c)) {
      NAME.lastIndex = i;
      const name = (NAME.exec(norm) as RegExpExecArray)[0];
      const isFunction = /^\s*\(/.test(norm.slice(i + name.length));
      if (!(EXPRESSION_CONSTANTS.includes(name) || (isFunction && EXPRESSION_FUNCTIONS.includes(name)))) {
        throw new QuantityError(
          text,
          isFunction
            ? `${name}() cannot be used in a calculation; the functions allowed are ${EXPRESSION_FUNCTIONS.join(', ')}.`
            : `“${name}” is not a name a calculation may use; write units right after a number (47pF) and use only pi, e or tau as names.`,
          'expression-invalid',
        );
      }
      out += ` ${name} `;
      i += name.length;
      continue;
    }
    if (c === '(') depth++;
    if (c === ')') depth = Math.max(0, depth - 1);
    if (c === ',' && depth === 0) throw commaError(text);
    if ('+-*/^(),'.includes(c) || /\s/.test(c)) {
      out += c;
      i++;
      continue;
    }
    throw new QuantityError(text, `The character “${original[i]}” cannot be used in a calculation; use numbers with units, + - * / ^, parentheses and ${EXPRESSION_FUNCTIONS.slice(0, 3).join(', ')} and similar.`, 'expression-invalid');
  }
  return { source: out, values };
}

/** Checks every node of the parsed tree against the allowed shapes. */
function checkTree(node: MathNode, text: string, valueCount: number): void {
  node.traverse((n: MathNode) => {
    const t = n.type;
    const ok =
      t === 'ParenthesisNode' ||
      (t === 'ConstantNode' && typeof (n as unknown as { value: unknown }).value === 'number') ||
      (t === 'OperatorNode' && OPERATOR_FUNCTIONS.has((n as unknown as { fn: string }).fn)) ||
      (t === 'SymbolNode' && isAllowedSymbol((n as unknown as { name: string }).name, valueCount)) ||
      (t === 'FunctionNode' && isAllowedCall(n));
    if (!ok) {
      throw new QuantityError(text, 'This calculation uses something other than numbers, units, arithmetic and the allowed functions.', 'expression-invalid');
    }
  });
}

function isAllowedSymbol(name: string, valueCount: number): boolean {
  if (EXPRESSION_CONSTANTS.includes(name) || EXPRESSION_FUNCTIONS.includes(name)) return true;
  const m = /^_q(\d+)$/.exec(name);
  return m !== null && Number(m[1]) < valueCount;
}

function isAllowedCall(n: MathNode): boolean {
  const fn = (n as unknown as { fn: MathNode }).fn;
  return fn.type === 'SymbolNode' && EXPRESSION_FUNCTIONS.includes((fn as unknown as { name: string }).name);
}

/** Turns a mathjs failure into a sentence for the technician. */
function explainFailure(text: string, err: unknown): QuantityError {
  if (err instanceof QuantityError) return err;
  const msg = err instanceof Error ? err.message : String(err);
  let why: string;
  if (/disabled/i.test(msg)) why = 'it calls a function that is disabled';
  else if (/Unexpected end|Parenthesis \) expected/i.test(msg)) why = 'it ends too early or a parenthesis is not closed';
  else if (/Unexpected (type of argument|operator)/i.test(msg) && /Unit/.test(msg)) why = 'it adds or compares a value with a unit and one without (give both a unit, or neither)';
  else if (/Units do not match|Unit mismatch|do not match/i.test(msg)) why = 'it adds or compares values of different kinds';
  else if (/Undefined (symbol|function)/i.test(msg)) why = 'it uses a name that is not allowed';
  else why = 'it is not a well-formed calculation';
  return new QuantityError(text, `This calculation could not be worked out: ${why}.`, 'expression-invalid', { cause: err });
}

/**
 * Works out a calculation and returns the result in SI units for a field of
 * kind `field`. Loads mathjs on first use. Throws QuantityError when the text
 * is not an allowed calculation, the result is not a finite real number, or
 * its dimension is not the field's.
 */
export async function evaluateQuantityExpression(text: string, field: QuantityUnit): Promise<number> {
  if (typeof text === 'string' && text.length > MAX_QUANTITY_LENGTH) {
    throw new QuantityError(text, `This entry is longer than ${MAX_QUANTITY_LENGTH} characters; shorten it.`, 'too-long');
  }
  if (looksLikeRange(text)) parseQuantity(text, field); // throws the single-value field's range message
  const { source, values } = tokenizeExpression(text, field);
  const { math, parse } = await loadRestrictedMath();
  let result: unknown;
  try {
    const tree = parse(source);
    checkTree(tree, text, values.length);
    const scope = new Map<string, unknown>();
    values.forEach((v, k) => scope.set(`${VAR}${k}`, v.unit === null ? v.value : math.unit(v.value, UNIT_KINDS[v.unit].mathName)));
    result = tree.compile().evaluate(scope);
  } catch (err) {
    throw explainFailure(text, err);
  }
  return resultInField(result, field, text, math);
}

function resultInField(result: unknown, field: QuantityUnit, text: string, math: MathJsInstance): number {
  let value: number;
  let bare = false;
  if (typeof result === 'number') {
    value = result;
    bare = true;
  } else if (isUnitLike(result)) {
    const u = result;
    const want = math.unit(1, UNIT_KINDS[field].mathName);
    if (u.equalBase(want)) {
      value = u.toNumber(UNIT_KINDS[field].mathName);
    } else if (u.dimensions.every((d) => d === 0)) {
      value = u.value ?? Number.NaN;
      bare = true;
    } else {
      const kind = QUANTITY_UNITS.find((q) => u.equalBase(math.unit(1, UNIT_KINDS[q].mathName)));
      const gave = kind ? `${UNIT_KINDS[kind].article} ${UNIT_KINDS[kind].noun} (${kind})` : `a value in ${u.formatUnits()}`;
      throw new QuantityError(text, `This calculation gives ${gave}, but this field needs ${describeField(field)}.`, 'wrong-unit');
    }
  } else if (typeof result === 'object' && result !== null && (result as { isComplex?: unknown }).isComplex === true) {
    throw new QuantityError(text, 'This calculation gives a complex number (for example the square root of a negative value); this field needs a real one.', 'not-finite');
  } else {
    throw new QuantityError(text, 'This calculation does not give a single number.', 'expression-invalid');
  }
  if (!Number.isFinite(value)) {
    throw new QuantityError(text, 'This calculation gives no finite value (for example a division by zero).', 'not-finite');
  }
  if (bare && field === 'm' && value !== 0) {
    throw new QuantityError(
      text,
      `This calculation gives ${Number(value.toPrecision(4))} with no unit, and a length needs one: write the unit on its numbers, e.g. 2*10mm or 10mm + 2mm.`,
      'no-unit',
    );
  }
  return value + 0;
}

function isUnitLike(x: unknown): x is Unit & { dimensions: number[]; value: number | null } {
  return typeof x === 'object' && x !== null && (x as { isUnit?: unknown }).isUnit === true;
}
