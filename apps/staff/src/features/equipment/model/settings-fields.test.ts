import { describe, expect, it } from 'vitest';
import { get } from 'react-hook-form';
import { DEFAULT_PLAN_SETTINGS } from '@fryline/production';
import { productionSettingsSchema, type ProductionSettingsInput } from '@fryline/schemas';
import { tempFromUnit } from '../../../lib/units';
import { settingsFieldNames, settingsGroups, toSettingsValues } from './settings-fields';

const stored = (): ProductionSettingsInput & { updatedAt: string | null } => ({
  equipment: structuredClone(DEFAULT_PLAN_SETTINGS.equipment) as ProductionSettingsInput['equipment'],
  schedule: structuredClone(DEFAULT_PLAN_SETTINGS.schedule) as ProductionSettingsInput['schedule'],
  spare: structuredClone(DEFAULT_PLAN_SETTINGS.spare) as ProductionSettingsInput['spare'],
  glazes: structuredClone(DEFAULT_PLAN_SETTINGS.glazes) as ProductionSettingsInput['glazes'],
  prices: { centsPerKg: {}, fryingOilCentsPerKg: 300 },
  roomTempC: 22,
  updatedAt: '2030-01-01T00:00:00Z',
});

describe('the equipment form', () => {
  it('holds exactly what the settings schema accepts: no save date, nothing lost', () => {
    const values = toSettingsValues(stored());
    expect(values).not.toHaveProperty('updatedAt');
    expect(productionSettingsSchema.safeParse(values).success).toBe(true);
    expect(values.glazes).toHaveLength(DEFAULT_PLAN_SETTINGS.glazes.length);
  });

  it('has an input for every number it names, and names each only once', () => {
    const values = toSettingsValues(stored());
    for (const name of settingsFieldNames) {
      const optional = settingsGroups.flatMap((g) => g.fields).find((f) => f.name === name)?.optional;
      if (!optional) expect(typeof get(values, name), name).toBe('number');
    }
    expect(new Set(settingsFieldNames).size).toBe(settingsFieldNames.length);
  });

  it('takes oil temperatures typed in °F within the usual 350–375 °F frying range (doughnut equipment makers’ tips; °C = (°F − 32) / 1.8, NIST SP 811)', () => {
    const values = toSettingsValues(stored());
    values.equipment.oil.startC = tempFromUnit(375, 'F');
    values.equipment.oil.floorC = tempFromUnit(350, 'F');
    const parsed = productionSettingsSchema.parse(values);
    expect(parsed.equipment.oil.startC).toBeCloseTo(190.56, 2);
    expect(parsed.equipment.oil.floorC).toBeCloseTo(176.67, 2);
  });

  it('refuses a lowest oil temperature above the start temperature, on the lowest-temperature field', () => {
    const values = toSettingsValues(stored());
    values.equipment.oil.floorC = tempFromUnit(380, 'F');
    const result = productionSettingsSchema.safeParse(values);
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.path.join('.')).toBe('equipment.oil.floorC');
    expect(settingsFieldNames).toContain('equipment.oil.floorC');
  });
});
