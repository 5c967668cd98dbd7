/**
 * Listing conditions, Drabyard's own grade scale for used originals, and the rubber-part usage options.
 *
 * Condition terms (NOS, NORS, used original, rebuilt, reproduction, core) are the trade's own words
 * (source: /work/shared/DOMAIN.md, "Condition and originality"). The five used-original grades and their
 * wording are ours, invented for Drabyard; they follow no published grading system.
 */

export const conditionCodes = ['nos', 'nors', 'used_original', 'rebuilt', 'reproduction', 'core'] as const;
export type Condition = (typeof conditionCodes)[number];

export const usedGradeCodes = ['ready', 'honest', 'weathered', 'hard_used', 'donor'] as const;
export type UsedGrade = (typeof usedGradeCodes)[number];

export const rubberUseCodes = ['serviceable', 'display_only'] as const;
export type RubberUse = (typeof rubberUseCodes)[number];

export interface ConditionInfo {
  code: Condition;
  label: string;
  /** Short form for badges and table cells. */
  shortLabel: string;
  /** Plain-language paragraph for the public listing page. */
  explanation: string;
  /** Made by (or for) the vehicle's original maker, rather than a later or other-maker part. */
  original: boolean;
  /** Made in the vehicle's service period (original or period replacement), not a modern part. */
  periodManufacture: boolean;
  /** Whether a used-original grade must accompany this condition. */
  requiresGrade: boolean;
}

export const conditions: Readonly<Record<Condition, ConditionInfo>> = {
  nos: {
    code: 'nos',
    label: 'New old stock (NOS)',
    shortLabel: 'NOS',
    explanation:
      'Made by the original maker in the period and never fitted or used. It may show marks from decades on a ' +
      'shelf, such as faded or missing packaging, light surface rust on bare metal, or storage scuffs. The ' +
      "seller's photos should show the maker's marks. Rubber and other age-sensitive materials age even when " +
      'unused, so check them before relying on the part.',
    original: true,
    periodManufacture: true,
    requiresGrade: false,
  },
  nors: {
    code: 'nors',
    label: 'New old replacement stock (NORS)',
    shortLabel: 'NORS',
    explanation:
      "Made in the period by a maker other than the vehicle's original supplier, as a replacement part, and " +
      'never fitted or used. It is period-correct but may carry a different maker\'s marks than the part the ' +
      'vehicle left the factory with. Like any old stock it can show shelf wear, and age-sensitive materials ' +
      'such as rubber age even when unused.',
    original: false,
    periodManufacture: true,
    requiresGrade: false,
  },
  used_original: {
    code: 'used_original',
    label: 'Used original',
    shortLabel: 'Used',
    explanation:
      'An original part removed from a vehicle. The seller grades it on the Drabyard used-parts scale (shown ' +
      "beside this listing) and the photos must show its actual condition and the maker's marks that prove it " +
      'is original. Expect honest wear; read the grade and look closely at the photos.',
    original: true,
    periodManufacture: true,
    requiresGrade: true,
  },
  rebuilt: {
    code: 'rebuilt',
    label: 'Rebuilt original',
    shortLabel: 'Rebuilt',
    explanation:
      'An original unit that has been taken apart and refurbished, for example with cylinders resleeved, worn ' +
      'internals and seals renewed, and housings cleaned and painted. The core is original; some internal parts ' +
      'are new. The seller should describe what was renewed.',
    original: true,
    periodManufacture: true,
    requiresGrade: false,
  },
  reproduction: {
    code: 'reproduction',
    label: 'Reproduction',
    shortLabel: 'Repro',
    explanation:
      'Newly made today to the pattern of the original part. It is not period manufacture and will not carry ' +
      "the original maker's marks, though it may carry the reproduction maker's own. A good choice where " +
      'originals are scarce or where a part must be new to be safe.',
    original: false,
    periodManufacture: false,
    requiresGrade: false,
  },
  core: {
    code: 'core',
    label: 'Core (for rebuilding)',
    shortLabel: 'Core',
    explanation:
      'An original unit sold to be rebuilt, not to be fitted as it is. It may be seized, worn out or incomplete; ' +
      'what matters is that the main castings or housings are sound enough to rebuild. Check the description for ' +
      'cracks and missing pieces.',
    original: true,
    periodManufacture: true,
    requiresGrade: false,
  },
};

export interface UsedGradeInfo {
  code: UsedGrade;
  /** 1 is best. */
  rank: 1 | 2 | 3 | 4 | 5;
  label: string;
  /** Plain-language meaning for the public listing page. */
  explanation: string;
}

// Our own scale (invented for Drabyard). Ranks let the sourcing planner ask for "at least Honest".
export const usedGrades: Readonly<Record<UsedGrade, UsedGradeInfo>> = {
  ready: {
    code: 'ready',
    rank: 1,
    label: 'Ready',
    explanation:
      'Clean, complete and working. Can go straight back on a vehicle after an ordinary clean; wear is light ' +
      'and cosmetic only.',
  },
  honest: {
    code: 'honest',
    rank: 2,
    label: 'Honest',
    explanation:
      'Complete and usable, showing its age: worn paint, light pitting or surface rust, small dents. Works as ' +
      'it is; a light refurbish makes it look right.',
  },
  weathered: {
    code: 'weathered',
    rank: 3,
    label: 'Weathered',
    explanation:
      'Needs refurbishing before use: heavier rust, stiff or worn moving parts, or small missing pieces such as ' +
      'a clip or screw. The main body is sound.',
  },
  hard_used: {
    code: 'hard_used',
    rank: 4,
    label: 'Hard-used',
    explanation:
      'Heavily worn or damaged, needing real repair work (welding, machining, new internals). Worth buying ' +
      'when nothing better can be found or as a pattern.',
  },
  donor: {
    code: 'donor',
    rank: 5,
    label: 'Donor',
    explanation:
      'Not usable as a whole. Sold for its sub-parts, its markings, or as a reference to copy. Expect cracks, ' +
      'heavy corrosion or missing major pieces.',
  },
};

export interface RubberUseInfo {
  code: RubberUse;
  label: string;
  explanation: string;
}

export const rubberUses: Readonly<Record<RubberUse, RubberUseInfo>> = {
  serviceable: {
    code: 'serviceable',
    label: 'For use on a vehicle',
    explanation: 'Offered as fit to be installed and used, subject to inspection by a qualified mechanic.',
  },
  display_only: {
    code: 'display_only',
    label: 'Display / authenticity only',
    explanation:
      'Offered for display or to show original markings only. Do not install it on a vehicle that is driven: ' +
      'rubber ages even unused and can fail without warning.',
  },
};

export function isCondition(value: unknown): value is Condition {
  return typeof value === 'string' && (conditionCodes as readonly string[]).includes(value);
}

export function isUsedGrade(value: unknown): value is UsedGrade {
  return typeof value === 'string' && (usedGradeCodes as readonly string[]).includes(value);
}

export function isRubberUse(value: unknown): value is RubberUse {
  return typeof value === 'string' && (rubberUseCodes as readonly string[]).includes(value);
}

function assertCondition(condition: Condition): void {
  if (!isCondition(condition)) {
    throw new TypeError(`Unknown listing condition: ${JSON.stringify(condition)}`);
  }
}

/**
 * True for parts made by (or for) the original maker: NOS, used originals, rebuilt originals and cores.
 * NORS is period-correct but another maker's part, so it is not "original"; see `isPeriodManufacture`.
 */
export function isOriginal(condition: Condition): boolean {
  assertCondition(condition);
  return conditions[condition].original;
}

/** True for anything made in the service period (everything except reproductions). */
export function isPeriodManufacture(condition: Condition): boolean {
  assertCondition(condition);
  return conditions[condition].periodManufacture;
}

/** True for parts that are old rubber if they are rubber at all, i.e. not newly made today. */
export function isAgedStock(condition: Condition): boolean {
  assertCondition(condition);
  // Rebuilt units get new seals when rebuilt, reproductions are new: neither is old rubber by definition.
  return condition === 'nos' || condition === 'nors' || condition === 'used_original' || condition === 'core';
}

export type ConditionCheck = { ok: true } | { ok: false; code: 'grade_required' | 'grade_not_allowed'; message: string };

/** A used original must carry a grade; other conditions must not (the grade scale means nothing for them). */
export function checkConditionGrade(condition: Condition, grade: UsedGrade | null | undefined): ConditionCheck {
  assertCondition(condition);
  if (grade != null && !isUsedGrade(grade)) {
    throw new TypeError(`Unknown used-original grade: ${JSON.stringify(grade)}`);
  }
  const info = conditions[condition];
  if (info.requiresGrade && grade == null) {
    return { ok: false, code: 'grade_required', message: `${info.label} listings need a grade.` };
  }
  if (!info.requiresGrade && grade != null) {
    return { ok: false, code: 'grade_not_allowed', message: `Grades apply only to used originals, not ${info.label}.` };
  }
  return { ok: true };
}

/** Label for display, e.g. "Used original: Honest". */
export function describeCondition(condition: Condition, grade?: UsedGrade | null): string {
  assertCondition(condition);
  const label = conditions[condition].label;
  if (condition === 'used_original' && grade != null) {
    if (!isUsedGrade(grade)) throw new TypeError(`Unknown used-original grade: ${JSON.stringify(grade)}`);
    return `${label}: ${usedGrades[grade].label}`;
  }
  return label;
}

/** True when `grade` is at least as good as `minimum` (rank 1 is best). */
export function meetsGrade(grade: UsedGrade, minimum: UsedGrade): boolean {
  if (!isUsedGrade(grade) || !isUsedGrade(minimum)) {
    throw new TypeError(`Unknown used-original grade: ${JSON.stringify(isUsedGrade(grade) ? minimum : grade)}`);
  }
  return usedGrades[grade].rank <= usedGrades[minimum].rank;
}
