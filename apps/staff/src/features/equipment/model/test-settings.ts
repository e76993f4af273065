import { DEFAULT_PLAN_SETTINGS } from '@fryline/production';
import type { ProductionSettingsInput } from '@fryline/schemas';

/** The built-in settings with a save date, as the API could hand them out: a starting point for the tests here. */
export function storedSettings(): ProductionSettingsInput & { updatedAt: string | null } {
  return {
    equipment: structuredClone(DEFAULT_PLAN_SETTINGS.equipment) as ProductionSettingsInput['equipment'],
    schedule: structuredClone(DEFAULT_PLAN_SETTINGS.schedule) as ProductionSettingsInput['schedule'],
    spare: structuredClone(DEFAULT_PLAN_SETTINGS.spare) as ProductionSettingsInput['spare'],
    glazes: structuredClone(DEFAULT_PLAN_SETTINGS.glazes) as ProductionSettingsInput['glazes'],
    prices: { centsPerKg: {}, fryingOilCentsPerKg: 300 },
    roomTempC: 22,
    dough: {
      temperature: structuredClone(DEFAULT_PLAN_SETTINGS.doughTemperature!) as NonNullable<ProductionSettingsInput['dough']>['temperature'],
      variations: [{ id: 'lemon-zest', name: 'Lemon zest dough', flavours: ['Lemon zest'], addIns: [{ name: 'Lemon zest', gramsPerKg: 10 }], addAt: 'after-mix' }],
      eggClass: 'large',
    },
    updatedAt: '2030-01-01T00:00:00Z',
  };
}
