import { DEFAULT_LAS_NULL } from './wellInfo';
import { formatLasNumber } from './formatLasNumber';
import type { DepthUnit } from './types';

type WellTextField = 'COMP' | 'WELL' | 'FLD' | 'LOC' | 'SRVC' | 'DATE' | 'UWI' | 'API' | 'PROV' | 'CNTY' | 'STAT' | 'CTRY';

export interface LasWriteCurve {
  mnemonic: string;
  unit?: string;
  apiCode?: string;
  description?: string;
  values: ArrayLike<number>;
}

/** What `writeLas` needs; a parsed `LasFile` fits as it is. */
export interface LasWriteInput {
  well?: Partial<Record<WellTextField, string>> & { NULL?: number };
  index: { mnemonic?: string; unit: DepthUnit | null; apiCode?: string; description?: string; values: ArrayLike<number> };
  curves: LasWriteCurve[];
  parameters?: { mnemonic: string; unit?: string; value: string; description?: string }[];
  other?: string;
}

const WELL_LINES: [WellTextField, string][] = [
  ['COMP', 'COMPANY'],
  ['WELL', 'WELL'],
  ['FLD', 'FIELD'],
  ['LOC', 'LOCATION'],
  ['PROV', 'PROVINCE'],
  ['CNTY', 'COUNTY'],
  ['STAT', 'STATE'],
  ['CTRY', 'COUNTRY'],
  ['SRVC', 'SERVICE COMPANY'],
  ['DATE', 'LOG DATE'],
  ['UWI', 'UNIQUE WELL ID'],
  ['API', 'API NUMBER'],
];

interface Line {
  mnemonic: string;
  unit: string;
  value: string;
  description: string;
}

/**
 * Writes a LAS 2.0 file, WRAP NO, CR LF line ends (CWLS LAS 2.0, §3.0): ~V, ~W (STRT/STOP/STEP from the
 * index; STEP 0 when the spacing varies), ~C with the index first, ~P and ~O when given, then ~A with
 * right-justified columns. NaN is written as NULL, −0 as 0. Mnemonics renamed MNEM:1, MNEM:2 by the reader
 * are written as they are. Throws on input the format cannot hold.
 *
 * @example
 * writeLas({ index: { unit: 'm', values: [1000, 1000.5] }, curves: [{ mnemonic: 'GR', unit: 'GAPI', values: [80, NaN] }] });
 * // → '~VERSION INFORMATION\r\nVERS.  2.0 : CWLS LOG ASCII STANDARD - VERSION 2.0\r\n…'
 */
export function writeLas(input: LasWriteInput): string {
  const { index, curves } = input;
  const n = index.values.length;
  const nullValue = input.well?.NULL ?? DEFAULT_LAS_NULL;
  if (index.unit !== 'm' && index.unit !== 'ft') throw new Error(`writeLas: the index unit must be 'm' or 'ft', got ${index.unit}`);
  if (n === 0) throw new Error('writeLas: the index has no values');
  if (!Number.isFinite(nullValue)) throw new Error(`writeLas: NULL must be a finite number, got ${nullValue}`);
  checkIndex(index.values);

  const indexMnemonic = index.mnemonic ?? 'DEPT';
  const seen = new Set<string>();
  for (const c of [{ mnemonic: indexMnemonic, unit: '', description: index.description }, ...curves]) {
    checkMnemonic(c.mnemonic);
    if (seen.has(c.mnemonic)) throw new Error(`writeLas: curve mnemonic '${c.mnemonic}' is used twice`);
    seen.add(c.mnemonic);
  }
  curves.forEach((c) => checkCurveValues(c, n, nullValue));

  const unitText = index.unit === 'm' ? 'M' : 'FT';
  const first = index.values[0];
  const last = index.values[n - 1];
  const out: string[] = [];

  out.push('~VERSION INFORMATION');
  out.push(
    ...alignLines([
      { mnemonic: 'VERS', unit: '', value: '2.0', description: 'CWLS LOG ASCII STANDARD - VERSION 2.0' },
      { mnemonic: 'WRAP', unit: '', value: 'NO', description: 'ONE LINE PER DEPTH STEP' },
    ]),
  );

  const wellLines: Line[] = [
    { mnemonic: 'STRT', unit: unitText, value: formatLasNumber(first), description: 'START DEPTH' },
    { mnemonic: 'STOP', unit: unitText, value: formatLasNumber(last), description: 'STOP DEPTH' },
    { mnemonic: 'STEP', unit: unitText, value: formatLasNumber(uniformStep(index.values)), description: 'STEP' },
    { mnemonic: 'NULL', unit: '', value: formatLasNumber(nullValue), description: 'NULL VALUE' },
  ];
  const well = input.well ?? {};
  const regional = well.CNTY || well.STAT || well.CTRY;
  for (const [field, label] of WELL_LINES) {
    const value = well[field] ?? '';
    const always = field === 'UWI' || (field === 'PROV' && !regional) || ['COMP', 'WELL', 'FLD', 'LOC', 'SRVC', 'DATE'].includes(field);
    if (value === '' && !always) continue;
    checkText(value, `well ${field}`);
    wellLines.push({ mnemonic: field, unit: '', value, description: label });
  }
  out.push('~WELL INFORMATION');
  out.push(...alignLines(wellLines));

  out.push('~CURVE INFORMATION');
  out.push(
    ...alignLines([
      curveLine({ mnemonic: indexMnemonic, unit: unitText, apiCode: index.apiCode, description: index.description ?? 'DEPTH' }),
      ...curves.map(curveLine),
    ]),
  );

  if (input.parameters && input.parameters.length > 0) {
    out.push('~PARAMETER INFORMATION');
    out.push(
      ...alignLines(
        input.parameters.map((p) => {
          checkMnemonic(p.mnemonic);
          const line = { mnemonic: p.mnemonic, unit: p.unit ?? '', value: p.value, description: p.description ?? '' };
          checkHeaderLine(line, `parameter ${p.mnemonic}`);
          return line;
        }),
      ),
    );
  }

  if (input.other) {
    out.push('~OTHER INFORMATION');
    for (const line of input.other.split(/\r?\n/)) {
      const t = line.trimStart();
      if (t.startsWith('~') || t.startsWith('#')) throw new Error(`writeLas: a line of other must not start with ~ or #: '${line}'`);
      out.push(line);
    }
  }

  out.push(`~A  ${[indexMnemonic, ...curves.map((c) => c.mnemonic)].join(' ')}`);
  out.push(...dataLines([index.values, ...curves.map((c) => c.values)], n, nullValue));
  return out.join('\r\n');
}

function curveLine(c: LasWriteCurve | { mnemonic: string; unit: string; apiCode?: string; description: string }): Line {
  const line = { mnemonic: c.mnemonic, unit: c.unit ?? '', value: c.apiCode ?? '', description: c.description ?? '' };
  checkHeaderLine(line, `curve ${c.mnemonic}`);
  return line;
}

function alignLines(lines: Line[]): string[] {
  const mw = Math.max(...lines.map((l) => l.mnemonic.length));
  const uw = Math.max(...lines.map((l) => l.unit.length));
  const vw = Math.max(...lines.map((l) => l.value.length));
  return lines.map((l) => `${l.mnemonic.padEnd(mw)}.${l.unit.padEnd(uw)}  ${l.value.padEnd(vw)} : ${l.description}`.trimEnd());
}

function dataLines(columns: ArrayLike<number>[], n: number, nullValue: number): string[] {
  const nullText = formatLasNumber(nullValue);
  const texts = columns.map((values) => {
    const t = new Array<string>(n);
    for (let i = 0; i < n; i++) t[i] = Number.isNaN(values[i]) ? nullText : formatLasNumber(values[i]);
    return t;
  });
  const widths = texts.map((t) => t.reduce((w, s) => Math.max(w, s.length), 0));
  const lines = new Array<string>(n);
  for (let i = 0; i < n; i++) {
    let line = '';
    for (let k = 0; k < texts.length; k++) line += (k === 0 ? '' : ' ') + texts[k][i].padStart(widths[k]);
    lines[i] = line;
  }
  return lines;
}

/** The spacing when it is the same everywhere (to a part in 1e9), else 0 as the standard asks (§5.4). */
function uniformStep(values: ArrayLike<number>): number {
  const n = values.length;
  if (n < 2) return 0;
  const step = (values[n - 1] - values[0]) / (n - 1);
  for (let i = 1; i < n; i++) {
    const d = values[i] - values[i - 1];
    if (Math.abs(d - step) > 1e-9 * Math.max(1, Math.abs(values[i]))) return 0;
  }
  // Float noise of the mean spacing (0.15240000000000001) is not part of the step.
  return Number(step.toPrecision(12));
}

function checkIndex(values: ArrayLike<number>): void {
  let direction = 0;
  for (let i = 0; i < values.length; i++) {
    if (!Number.isFinite(values[i])) throw new Error(`writeLas: index value ${values[i]} at row ${i} is not a finite number`);
    if (i === 0) continue;
    const d = Math.sign(values[i] - values[i - 1]);
    if (d === 0 || (direction !== 0 && d !== direction)) {
      throw new Error(`writeLas: the index must be strictly increasing or decreasing (row ${i})`);
    }
    direction = d;
  }
}

function checkCurveValues(curve: LasWriteCurve, n: number, nullValue: number): void {
  if (curve.values.length !== n) {
    throw new Error(`writeLas: curve ${curve.mnemonic} has ${curve.values.length} values but the index has ${n}`);
  }
  for (let i = 0; i < n; i++) {
    const v = curve.values[i];
    if (v === nullValue)
      throw new Error(`writeLas: curve ${curve.mnemonic} holds the NULL value ${nullValue} at row ${i}; choose another NULL`);
    if (!Number.isNaN(v) && !Number.isFinite(v))
      throw new Error(`writeLas: curve ${curve.mnemonic} has a non-finite value ${v} at row ${i}`);
  }
}

/** No spaces, dots or colons (§5.2), except the MNEM:n form the reader gives repeated mnemonics: it stays unambiguous. */
function checkMnemonic(mnemonic: string): void {
  const base = mnemonic.replace(/:\d+$/, '');
  if (base === '' || /[\s.:]/.test(base)) {
    throw new Error(`writeLas: mnemonic '${mnemonic}' must be non-empty, without spaces, dots or colons`);
  }
}

/** The three delimiters (first dot, first space after it, last colon, §5.2) must stay unambiguous. */
function checkHeaderLine(line: Line, what: string): void {
  if (/[\s:]/.test(line.unit)) throw new Error(`writeLas: the unit of ${what} must not contain spaces or colons`);
  if (line.description.includes(':')) throw new Error(`writeLas: the description of ${what} must not contain a colon`);
  checkText(line.value, what);
  checkText(line.description, what);
}

function checkText(text: string, what: string): void {
  if (/[\r\n]/.test(text)) throw new Error(`writeLas: the text of ${what} must be on one line`);
}
