import { EngineInputError } from './errors';
import { roundTo } from './numbers';

/**
 * Trade station notation: hundreds of feet, a plus sign, then feet (20 ft -> "0+20", 125.5 ft -> "1+25.5").
 * Decimals are kept only where the value has them, to at most `places` places.
 */
export function formatStation(stationFt: number, places = 2): string {
  if (!Number.isFinite(stationFt)) throw new EngineInputError('stationFt', 'station must be a finite number');
  const rounded = roundTo(Math.abs(stationFt), places);
  const hundreds = Math.floor(rounded / 100 + 1e-9);
  const feet = roundTo(rounded - hundreds * 100, places);
  const [whole, fraction] = feet.toFixed(places).split('.');
  const trimmed = fraction.replace(/0+$/, '');
  const feetText = whole.padStart(2, '0') + (trimmed ? `.${trimmed}` : '');
  const sign = stationFt < 0 && rounded > 0 ? '-' : '';
  return `${sign}${hundreds}+${feetText}`;
}

const STATION_PATTERN = /^\s*(-)?(\d+)\+(\d{2}(?:\.\d+)?)\s*$/;
const PLAIN_FEET = /^\s*-?\d+(?:\.\d+)?\s*$/;

/** Accepts "1+25.5" or plain feet ("125.5"); anything else is refused with the text it got. */
export function parseStation(text: string): number {
  const match = STATION_PATTERN.exec(text);
  if (match) {
    const feet = Number(match[3]);
    if (feet >= 100) throw new EngineInputError('station', `"${text}" has 100 ft or more after the plus sign`);
    const value = Number(match[2]) * 100 + feet;
    return match[1] ? -value : value;
  }
  if (PLAIN_FEET.test(text)) return Number(text);
  throw new EngineInputError('station', `"${text}" is not a station (expected e.g. 0+20 or 1+25.5)`);
}
