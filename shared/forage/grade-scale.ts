import { AFGC_GRADES, USDA_ALFALFA_GRADES, USDA_GRASS_GRADES } from './grade-names';
import type { ForageClass } from '../contracts/enums';

/** Which published grade table a grade name belongs to. */
export type GradeScaleName = 'usda-alfalfa' | 'usda-grass' | 'afgc';

/** A grade's place on its table: rank 1 is the best; `of` is how many grades the table has. */
export interface GradeStanding {
  name: string;
  scale: GradeScaleName;
  rank: number;
  of: number;
}

const SCALES: Record<GradeScaleName, readonly string[]> = {
  'usda-alfalfa': USDA_ALFALFA_GRADES,
  'usda-grass': USDA_GRASS_GRADES,
  afgc: AFGC_GRADES,
};

/** The USDA table a lot is graded on: grass hay on the grass table, legumes and mixes on the alfalfa table. */
export function usdaScaleFor(forageClass: ForageClass): GradeScaleName {
  return forageClass === 'grass' ? 'usda-grass' : 'usda-alfalfa';
}

/** Every grade of a table, best first. */
export function gradesOf(scale: GradeScaleName): readonly string[] {
  return SCALES[scale];
}

/** Where a grade sits on its table, or null for a name the table does not have. */
export function gradeStanding(name: string, scale: GradeScaleName): GradeStanding | null {
  const grades = SCALES[scale];
  const index = grades.indexOf(name);
  return index < 0 ? null : { name, scale, rank: index + 1, of: grades.length };
}
