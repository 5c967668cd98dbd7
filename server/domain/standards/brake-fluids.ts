/**
 * Motor vehicle brake fluids.
 * source: FMVSS No. 116 (49 CFR 571.116), via REFERENCES.md — minimum dry and wet equilibrium reflux boiling
 * points (S5.1.1, S5.1.2) and colour (S5.1.14); DOT 4 wet minimum per NHTSA interpretation 12089.
 * That DOT 5 (silicone) must not be mixed with the glycol grades is common practice.
 */

export const BRAKE_FLUID_SOURCE = 'FMVSS No. 116 (49 CFR 571.116), via REFERENCES.md';

export const brakeFluidGrades = ['DOT 3', 'DOT 4', 'DOT 5', 'DOT 5.1'] as const;
export type BrakeFluidGrade = (typeof brakeFluidGrades)[number];

export interface BrakeFluid {
  grade: BrakeFluidGrade;
  base: 'glycol' | 'silicone';
  dryBoilingMinC: number;
  dryBoilingMinF: number;
  wetBoilingMinC: number;
  wetBoilingMinF: number;
  colour: string;
  source: string;
}

const fluids: Record<BrakeFluidGrade, BrakeFluid> = {
  'DOT 3': { grade: 'DOT 3', base: 'glycol', dryBoilingMinC: 205, dryBoilingMinF: 401, wetBoilingMinC: 140, wetBoilingMinF: 284, colour: 'colourless to amber', source: BRAKE_FLUID_SOURCE },
  'DOT 4': { grade: 'DOT 4', base: 'glycol', dryBoilingMinC: 230, dryBoilingMinF: 446, wetBoilingMinC: 155, wetBoilingMinF: 311, colour: 'colourless to amber', source: BRAKE_FLUID_SOURCE },
  'DOT 5': { grade: 'DOT 5', base: 'silicone', dryBoilingMinC: 260, dryBoilingMinF: 500, wetBoilingMinC: 180, wetBoilingMinF: 356, colour: 'purple', source: BRAKE_FLUID_SOURCE },
  'DOT 5.1': { grade: 'DOT 5.1', base: 'glycol', dryBoilingMinC: 260, dryBoilingMinF: 500, wetBoilingMinC: 180, wetBoilingMinF: 356, colour: 'colourless to amber', source: BRAKE_FLUID_SOURCE },
};

/** "dot3", "DOT-5.1", "Dot 4" -> the grade; null when it is none of them. */
export function parseBrakeFluidGrade(input: string): BrakeFluidGrade | null {
  const m = /^DOT\s*-?\s*(3|4|5\.1|5)$/i.exec(input.trim());
  return m ? (`DOT ${m[1]}` as BrakeFluidGrade) : null;
}

export function brakeFluid(grade: string): BrakeFluid | null {
  const g = parseBrakeFluidGrade(grade);
  return g ? fluids[g] : null;
}

export interface Compatibility {
  compatible: boolean;
  reason: string;
  source: string;
}

/** Whether two fluids may share a system. Throws RangeError on an unknown grade. */
export function compatible(a: string, b: string): Compatibility {
  const fa = brakeFluid(a);
  const fb = brakeFluid(b);
  if (!fa || !fb) throw new RangeError(`Unknown brake fluid grade: ${!fa ? a : b}. Use DOT 3, DOT 4, DOT 5 or DOT 5.1.`);
  const practice = 'common practice, no published source';
  if (fa.base !== fb.base) {
    return {
      compatible: false,
      reason: 'Silicone DOT 5 must not be mixed with the glycol grades (DOT 3, 4, 5.1); flush the system fully when changing type.',
      source: practice,
    };
  }
  if (fa.grade === fb.grade) return { compatible: true, reason: `Same grade (${fa.grade}).`, source: practice };
  return {
    compatible: true,
    reason: `Both are glycol based and mix; the mixture is no better than the lower grade's boiling points.`,
    source: practice,
  };
}
