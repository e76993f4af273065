import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  DDT_RANGE_C, DEFAULT_DDT_C, driftingFermentationMinutes, fermentationMinutes, HAND_MIX_FRICTION_C, liquidTemperatureC, STAND_MIXER_FRICTION_C,
} from './temperature.js';
import { cToF, fDeltaToC, fToC } from './units.js';

describe('desired dough temperature (King Arthur Baking, "Desired Dough Temperature")', () => {
  it('worked example with a preferment: 75 × 4 − 71 − 71 − 71 − 20 = 67 °F', () => {
    const liquid = liquidTemperatureC({
      targetC: fToC(75),
      frictionC: fDeltaToC(20),
      factors: [{ name: 'Room', tempC: fToC(71) }, { name: 'Flour', tempC: fToC(71) }, { name: 'Preferment', tempC: fToC(71) }],
    });
    expect(cToF(liquid)).toBeCloseTo(67, 9);
    expect(liquid).toBeCloseTo(fToC(67), 9);
  });

  it('without a preferment the rule multiplies by 3: 75 × 3 − 71 − 71 − 20 = 63 °F', () => {
    const liquid = liquidTemperatureC({ targetC: fToC(75), frictionC: fDeltaToC(20), factors: [{ name: 'Room', tempC: fToC(71) }, { name: 'Flour', tempC: fToC(71) }] });
    expect(cToF(liquid)).toBeCloseTo(63, 9);
  });

  it('gives the same answer in °C and °F because friction is a difference (NIST SP 811: a 1 °F interval is 5/9 °C)', () => {
    fc.assert(fc.property(
      fc.double({ min: 60, max: 90, noNaN: true }), fc.double({ min: 50, max: 95, noNaN: true }), fc.double({ min: 50, max: 95, noNaN: true }), fc.double({ min: 0, max: 40, noNaN: true }),
      (ddtF, roomF, flourF, frictionF) => {
        const inF = 3 * ddtF - roomF - flourF - frictionF;
        const inC = liquidTemperatureC({ targetC: fToC(ddtF), frictionC: fDeltaToC(frictionF), factors: [{ name: 'Room', tempC: fToC(roomF) }, { name: 'Flour', tempC: fToC(flourF) }] });
        expect(cToF(inC)).toBeCloseTo(inF, 6);
      },
    ));
  });

  it('defaults: 80 °F, inside the 78–82 °F published for yeast-raised doughnuts (BAKERpedia; equipment makers\' tips); friction 20 °F stand mixer, 5 °F by hand (King Arthur)', () => {
    expect(DEFAULT_DDT_C).toBeGreaterThanOrEqual(DDT_RANGE_C.min);
    expect(DEFAULT_DDT_C).toBeLessThanOrEqual(DDT_RANGE_C.max);
    expect(DDT_RANGE_C.min).toBeCloseTo(25.56, 2);
    expect(DDT_RANGE_C.max).toBeCloseTo(27.78, 2);
    expect(STAND_MIXER_FRICTION_C).toBeCloseTo(20 / 1.8, 12);
    expect(HAND_MIX_FRICTION_C).toBeCloseTo(5 / 1.8, 12);
  });
});

describe('fermentation follows the dough temperature (Forno Bravo: the rate doubles for each +17 °F)', () => {
  it('worked example: 2 h at 80 °F ≈ 4 h at 63 °F, for a dough held at that temperature', () => {
    expect(fermentationMinutes(120, fToC(80), fToC(63))).toBeCloseTo(240, 9);
    expect(driftingFermentationMinutes({ referenceMinutes: 120, referenceTempC: fToC(80), startC: fToC(63), surroundC: fToC(63), settleMinutes: 90 })).toBeCloseTo(240, 9);
    expect(driftingFermentationMinutes({ referenceMinutes: 240, referenceTempC: fToC(63), startC: fToC(80), surroundC: fToC(80), settleMinutes: 0 })).toBeCloseTo(120, 9);
  });

  it('a dough drifting from one temperature towards another takes between the times at the two (the same rule along the way)', () => {
    fc.assert(fc.property(
      fc.double({ min: 10, max: 32, noNaN: true }), fc.double({ min: 10, max: 32, noNaN: true }), fc.double({ min: 5, max: 240, noNaN: true }), fc.double({ min: 30, max: 900, noNaN: true }),
      (start, surround, tau, ref) => {
        const t = driftingFermentationMinutes({ referenceMinutes: ref, referenceTempC: 24, startC: start, surroundC: surround, settleMinutes: tau });
        const a = fermentationMinutes(ref, 24, start);
        const b = fermentationMinutes(ref, 24, surround);
        expect(t).toBeGreaterThanOrEqual(Math.min(a, b) * (1 - 1e-6));
        expect(t).toBeLessThanOrEqual(Math.max(a, b) * (1 + 1e-6));
      },
    ));
  });
});
