// The engine computes in US customary units; a rule profile may ask for metric display only.
const M_PER_FT = 0.3048;
const MM_PER_IN = 25.4;

export type DisplayUnits = 'us' | 'metric';

export function displayLength(valueFt: number, units: DisplayUnits): { value: number; unit: 'ft' | 'm' } {
  return units === 'metric' ? { value: valueFt * M_PER_FT, unit: 'm' } : { value: valueFt, unit: 'ft' };
}

export function displaySmallLength(valueIn: number, units: DisplayUnits): { value: number; unit: 'in' | 'mm' } {
  return units === 'metric' ? { value: valueIn * MM_PER_IN, unit: 'mm' } : { value: valueIn, unit: 'in' };
}
