/** Parsing of command-line option values, with errors that name the option and the allowed form. */
import { InputError, InputRangeError } from '../../sim/errors.js';

/** Parses a comma-separated list of numbers, e.g. "--heights=0,1,2". */
export function parseNumberList(option: string, text: string, min = -Infinity, max = Infinity, unit = ''): number[] {
  const parts = text.split(',').map((s) => s.trim()).filter((s) => s.length > 0);
  if (parts.length === 0) throw new InputError(`--${option}`, 'expected a comma-separated list of numbers');
  return parts.map((part) => {
    const value = Number(part);
    if (!Number.isFinite(value)) throw new InputError(`--${option}`, `"${part}" is not a number`);
    if (value < min || value > max) throw new InputRangeError(`--${option}`, value, `${min}..${max}${unit ? ' ' + unit : ''}`);
    return value;
  });
}

/** Parses one number option. */
export function parseNumber(option: string, text: string, min = -Infinity, max = Infinity, unit = ''): number {
  const values = parseNumberList(option, text, min, max, unit);
  if (values.length !== 1) throw new InputError(`--${option}`, 'expected a single number');
  return values[0];
}

/** Parses an integer option within a range. */
export function parseInteger(option: string, text: string, min: number, max: number): number {
  const value = parseNumber(option, text, min, max);
  if (!Number.isInteger(value)) throw new InputError(`--${option}`, `${value} is not a whole number (allowed ${min}..${max})`);
  return value;
}

/** Parses "--fan=FROM,TO,COUNT" (degrees, degrees, rays) into the list of elevations. */
export function parseFan(text: string, maxCount: number, maxAbs_deg: number): number[] {
  const values = parseNumberList('fan', text);
  if (values.length !== 3) throw new InputError('--fan', 'expected FROM,TO,COUNT (degrees, degrees, number of rays)');
  const [from, to, count] = values;
  for (const v of [from, to]) {
    if (Math.abs(v) > maxAbs_deg) throw new InputRangeError('--fan', v, `-${maxAbs_deg}..${maxAbs_deg} degrees`);
  }
  if (!Number.isInteger(count) || count < 1 || count > maxCount) throw new InputRangeError('--fan COUNT', count, `1..${maxCount} rays`);
  if (count === 1) return [from];
  return Array.from({ length: count }, (_, i) => from + ((to - from) * i) / (count - 1));
}
