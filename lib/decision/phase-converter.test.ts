import { describe, expect, it } from 'vitest';
import { assessSupply, DEMO_CONVERTER_COSTS } from './phase-converter';

// Converter costs are invented demo figures; the 1.5 × sizing is common practice; the 10 % voltage
// tolerance is IEC 60038 from memory.
describe('assessSupply', () => {
  it('sizes a converter at 1.5 × the motor for a three-phase machine in a single-phase shop', () => {
    // 2.2 kW × 1.5 = 3.3 kW → the 4 kW size.
    const a = assessSupply({ voltage: 400, phases: 3, motorKw: 2.2 }, { voltage: 230, phases: 1 });
    expect(a.verdict).toBe('converter-needed');
    expect(a.converterKw).toBe(4);
    expect(a.converterCost).toEqual(DEMO_CONVERTER_COSTS[1]!.cost);
  });

  it('takes the size that exactly covers the load', () => {
    // 5 kW × 1.5 = 7.5 kW → the 7.5 kW size.
    expect(assessSupply({ voltage: 400, phases: 3, motorKw: 5 }, { voltage: 230, phases: 1 }).converterKw).toBe(7.5);
  });

  it('gives no size when the motor power is not recorded', () => {
    const a = assessSupply({ voltage: 400, phases: 3, motorKw: null }, { voltage: 230, phases: 1 });
    expect(a).toMatchObject({ verdict: 'converter-needed', converterKw: null, converterCost: null });
  });

  it('gives no size beyond the largest listed converter', () => {
    expect(assessSupply({ voltage: 400, phases: 3, motorKw: 15 }, { voltage: 230, phases: 1 }).converterCost).toBeNull();
  });

  it.each([
    [{ voltage: 400, phases: 3 as const, motorKw: 4 }, { voltage: 400, phases: 3 as const }],
    [{ voltage: 380, phases: 3 as const, motorKw: 4 }, { voltage: 415, phases: 3 as const }],
    // A single-phase 230 V machine on a 400 V three-phase shop runs phase to neutral: 400 / √3 ≈ 231 V.
    [{ voltage: 230, phases: 1 as const, motorKw: 1.1 }, { voltage: 400, phases: 3 as const }],
    [{ voltage: 240, phases: 1 as const, motorKw: 1.1 }, { voltage: 230, phases: 1 as const }],
  ])('finds that %o runs on %o', (machine, shop) => {
    expect(assessSupply(machine, shop).verdict).toBe('runs');
  });

  it('flags a voltage outside 10 %', () => {
    const a = assessSupply({ voltage: 230, phases: 3, motorKw: 4 }, { voltage: 400, phases: 3 });
    expect(a.verdict).toBe('voltage-differs');
  });

  it('says unknown without a nameplate or without the shop’s supply', () => {
    expect(assessSupply(null, { voltage: 400, phases: 3 }).verdict).toBe('unknown');
    expect(assessSupply({ voltage: 400, phases: 3, motorKw: 4 }, null).verdict).toBe('unknown');
  });
});
