import { describe, expect, it } from 'vitest';
import { twoCollarTest } from './two-collar';
import { tailstockAlignmentFromIndicator } from './tailstock-alignment';

describe('two-collar test', () => {
  it('gives e = 0.015 mm for 25.000 and 25.030 mm collars 300 mm apart', () => {
    // Worked example of the two-collar method [src: as taught in classic lathe-operation manuals]:
    // e = (25.030 − 25.000)/2 = 0.015 mm; taper on diameter 0.030 mm / 0.3 m = 0.1 mm/m.
    const r = twoCollarTest({ setup: 'between-centres', diameterNearHeadstockMm: 25, diameterNearTailstockMm: 25.03, collarDistanceMm: 300 });
    expect(r.radialOffsetMm).toBeCloseTo(0.015, 9);
    expect(r.taperMmPerM).toBeCloseTo(0.1, 9);
    // Tail end larger: tailstock sits away from the tool, move it toward the operator by e.
    expect(r.tailstockCorrection).toMatchObject({ move: 'toward-operator' });
    expect(r.tailstockCorrection!.byMm).toBeCloseTo(0.015, 9);
  });

  it('gives 0.001 mm over 250 mm for collars of 29.630 and 29.632 mm', () => {
    // Worked example: e = (29.632 − 29.630)/2 = 0.001 mm; that this is an excellent alignment is common practice.
    const r = twoCollarTest({ setup: 'between-centres', diameterNearHeadstockMm: 29.63, diameterNearTailstockMm: 29.632, collarDistanceMm: 250 });
    expect(r.radialOffsetMm).toBeCloseTo(0.001, 9);
  });

  it('moves the tailstock away from the operator when the tail end comes out smaller', () => {
    const r = twoCollarTest({ setup: 'between-centres', diameterNearHeadstockMm: 30.02, diameterNearTailstockMm: 30, collarDistanceMm: 200, centresDistanceMm: 400 });
    expect(r.tailstockCorrection?.move).toBe('away-from-operator');
    // Axis error grows linearly from the headstock centre: 0.01 over 200 mm → 0.02 at 400 mm.
    expect(r.tailstockCorrection!.byMm).toBeCloseTo(0.02, 9);
  });

  it('gives no tailstock correction for work held in the chuck', () => {
    const r = twoCollarTest({ setup: 'in-chuck', diameterNearHeadstockMm: 30, diameterNearTailstockMm: 30.01, collarDistanceMm: 100 });
    expect(r.tailstockCorrection).toBeNull();
  });
});

describe('tailstock alignment from an indicator run', () => {
  it('reports 0.02 mm offset toward the operator and the move to correct it', () => {
    // common practice: an indicator run found 0.02 mm misalignment along the test bar
    const r = tailstockAlignmentFromIndicator(0, 0.02, 250);
    expect(r.offsetMm).toBeCloseTo(0.02, 9);
    expect(r.move).toBe('away-from-operator');
    expect(r.moveByMm).toBeCloseTo(0.02, 9);
  });
});
