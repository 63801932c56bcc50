import { BINARY_FILE_MESSAGE, decodeText } from '../decodeText';
import { type Problem, ProblemList } from '../problem';
import { orderIndex } from './checkIndex';
import { depthsInMetres, normaliseDepthUnit } from './depthUnit';
import { checkNullSentinels } from './findNullSentinel';
import { findItem, readItems, readOther, renameDuplicates } from './headerSections';
import { type RawSection, findSections, splitLines } from './lasLines';
import { readData } from './readData';
import type { HeaderItem, LasCurve, LasFile, LasIndex } from './types';
import { readVersion } from './versionInfo';
import { emptyWellInfo, readWellInfo } from './wellInfo';

/**
 * Reads a LAS 2.0 file (CWLS "LAS Version 2.0: A Digital Standard for Logs", 2014/2017 updates), WRAP NO or
 * YES, from text or from bytes (decoded by `decodeText`). Never throws: problems come back with their
 * 1-based line in `errors` (refuse the import) and `warnings` (show them), together with everything that
 * could be read. Depths come out ascending.
 *
 * @example
 * const las = parseLas(text);
 * if (las.errors.length === 0) console.log(las.index.valuesM, las.curves.map((c) => c.mnemonic));
 */
export function parseLas(input: string | Uint8Array): LasFile {
  let text: string;
  try {
    text = typeof input === 'string' ? input : decodeText(input).text;
  } catch {
    return emptyResult([{ line: 1, message: BINARY_FILE_MESSAGE }]);
  }

  const lines = splitLines(text);
  const errors = new ProblemList();
  const warnings = new ProblemList();
  const notes: Problem[] = [];
  const sections = findSections(lines, errors, warnings);
  const picked = pickSections(sections, warnings);
  const lastLine = lastContentLine(lines);
  const dataSection = picked.get('A');
  const missingAt = dataSection ? dataSection.line : lastLine;

  const versionSection = picked.get('V');
  let version: number | null = null;
  let wrap: 'YES' | 'NO' | null = null;
  if (!versionSection) errors.add(1, 'the ~V section is missing');
  else {
    if (sections[0] !== versionSection) warnings.add(versionSection.line, 'the ~V section should be the first section');
    const info = readVersion(lines, versionSection, errors, warnings);
    if (info.las3Line !== undefined) return emptyResult(errors.finish(), info.version);
    ({ version, wrap } = info);
  }

  const wellSection = picked.get('W');
  if (!wellSection) errors.add(missingAt, 'the ~W section is missing');
  const wellItems = wellSection ? readItems(lines, wellSection, warnings) : [];
  const well = readWellInfo(wellItems, wellSection, version !== null && version < 2, warnings);

  const curveSection = picked.get('C');
  if (!curveSection) errors.add(missingAt, 'the ~C section is missing');
  const curveItems = curveSection ? readItems(lines, curveSection, warnings) : [];
  if (curveSection && curveItems.length === 0) errors.add(curveSection.line, '~C lists no curves');
  renameDuplicates(curveItems, warnings);

  const parameterSection = picked.get('P');
  const parameters = parameterSection ? readItems(lines, parameterSection, warnings) : [];
  const otherSection = picked.get('O');
  const other = otherSection ? readOther(lines, otherSection) : '';

  if (!dataSection) errors.add(lastLine, 'the ~A section is missing');
  if (wrap === null) wrap = guessWrap(dataSection, curveItems.length, lines);

  const mnemonics = curveItems.map((c) => c.mnemonic);
  const data =
    dataSection && curveItems.length > 0
      ? readData(lines, dataSection.start, dataSection.end, { mnemonics, wrap: wrap === 'YES', nullValue: well.NULL, errors, warnings })
      : { columns: curveItems.map(() => new Float64Array(0)), lineOfRow: new Int32Array(0), afterRefused: new Uint8Array(0), rowCount: 0 };
  if (dataSection && curveItems.length > 0 && data.rowCount === 0 && errors.count === 0) {
    errors.add(dataSection.line, 'the ~A section holds no data');
  }

  const indexItem = curveItems[0];
  if (indexItem) {
    orderIndex(
      data,
      {
        strt: well.STRT,
        stop: well.STOP,
        step: well.STEP,
        strtItem: findItem(wellItems, 'STRT'),
        stopItem: findItem(wellItems, 'STOP'),
        stepItem: findItem(wellItems, 'STEP'),
        nullValue: well.NULL,
      },
      { mnemonic: indexItem.mnemonic, errors, warnings, notes },
    );
    const nullLine = findItem(wellItems, 'NULL')?.line ?? 0;
    checkNullSentinels(data.columns.slice(1), mnemonics.slice(1), data.lineOfRow, data.rowCount, well.NULL, nullLine, errors, warnings);
  }

  const n = data.rowCount;
  const index = indexItem ? buildIndex(indexItem, data.columns[0].slice(0, n), wellItems, errors, warnings) : emptyIndex();
  const curves: LasCurve[] = curveItems.slice(1).map((item, k) => ({
    mnemonic: item.mnemonic,
    unit: item.unit,
    apiCode: item.value,
    description: item.description,
    values: data.columns[k + 1].slice(0, n),
  }));

  return { version, wrap, well, curves, index, parameters, other, notes, warnings: warnings.finish(), errors: errors.finish() };
}

/** The first section of each letter; repeats and anything after ~A are reported and ignored. */
function pickSections(sections: RawSection[], warnings: ProblemList): Map<string, RawSection> {
  const picked = new Map<string, RawSection>();
  let dataSeen = false;
  for (const s of sections) {
    if (dataSeen) {
      warnings.add(s.line, '~A must be the last section; the section on this line is ignored');
      continue;
    }
    if (s.letter === 'A') dataSeen = true;
    if (!picked.has(s.letter)) picked.set(s.letter, s);
    else if ('VWCPO'.includes(s.letter)) warnings.add(s.line, `only one ~${s.letter} section is allowed; this one is ignored`);
  }
  return picked;
}

/** Without WRAP, a first data line holding one value while ~C lists more curves means wrapped data. */
function guessWrap(section: RawSection | undefined, curveCount: number, lines: string[]): 'YES' | 'NO' {
  if (!section || curveCount < 2) return 'NO';
  for (let i = section.start; i < section.end; i++) {
    const t = lines[i].trim();
    if (t === '' || t.startsWith('#')) continue;
    return t.split(/\s+/).length === 1 ? 'YES' : 'NO';
  }
  return 'NO';
}

function buildIndex(item: HeaderItem, values: Float64Array, wellItems: HeaderItem[], errors: ProblemList, warnings: ProblemList): LasIndex {
  const strtUnit = findItem(wellItems, 'STRT')?.unit ?? '';
  const rawUnit = item.unit !== '' ? item.unit : strtUnit;
  const unit = normaliseDepthUnit(rawUnit);
  if (rawUnit === '') errors.add(item.line, `the index curve ${item.mnemonic} has no unit; expected M, FT or F`);
  else if (unit === null) {
    errors.add(item.line, `the index curve ${item.mnemonic} has unit '${rawUnit}'; expected a depth unit M, FT or F`);
  } else if (strtUnit !== '' && normaliseDepthUnit(strtUnit) !== unit) {
    // Units must match on STRT, STOP, STEP and the index (CWLS LAS 2.0, §5.4).
    warnings.add(item.line, `the index unit ${item.unit} differs from the STRT unit ${strtUnit}; ${item.unit} is used`);
  }
  return {
    mnemonic: item.mnemonic,
    unit,
    rawUnit,
    apiCode: item.value,
    description: item.description,
    values,
    valuesM: unit === null ? new Float64Array(values.length).fill(NaN) : depthsInMetres(values, unit),
  };
}

function emptyIndex(): LasIndex {
  return { mnemonic: '', unit: null, rawUnit: '', apiCode: '', description: '', values: new Float64Array(0), valuesM: new Float64Array(0) };
}

function emptyResult(errors: Problem[], version: number | null = null): LasFile {
  return {
    version,
    wrap: 'NO',
    well: emptyWellInfo(),
    curves: [],
    index: emptyIndex(),
    parameters: [],
    other: '',
    notes: [],
    warnings: [],
    errors,
  };
}

function lastContentLine(lines: string[]): number {
  let n = lines.length;
  while (n > 1 && lines[n - 1].trim() === '') n--;
  return n;
}
