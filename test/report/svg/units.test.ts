import { describe, expect, it } from 'vitest';
import { axisLabel, unitOf } from '../../../src/report/svg/units.js';

describe('axisLabel', () => {
  it('adds the unit of a known suffix and keeps the column name whole', () => {
    expect(axisLabel('depth_m')).toBe('depth_m (m)');
    expect(axisLabel('exit_temp_c')).toBe('exit_temp_c (°C)');
    expect(axisLabel('humidity_pct')).toBe('humidity_pct (%)');
    expect(axisLabel('juice_L')).toBe('juice_L (L)');
  });
  it('leaves names without a known suffix as they are', () => {
    expect(axisLabel('brix')).toBe('brix');
    expect(axisLabel('day_')).toBe('day_');
    expect(axisLabel('_m')).toBe('_m');
    expect(unitOf('rbf(x; c=1)')).toBeNull();
  });
});
