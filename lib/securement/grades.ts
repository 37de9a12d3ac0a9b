/**
 * Welded steel chain grades: the columns of the 49 CFR 393.108 chain table and the way the
 * grade is stamped on links.
 *
 * Mark examples (49 CFR 393.108, chain table notes, JJK-108 copy, verified): grade 30 is
 * marked 3, 30 or 300; grade 43: 4, 43 or 430; grade 70: 7, 70 or 700; grade 80: 8, 80 or
 * 800; grade 100: 10, 100 or 1000.
 *
 * @module
 */

/**
 * The grades that are columns of the 49 CFR 393.108 chain table.
 *
 * @example
 * CHAIN_GRADES.includes(70); // true
 */
export const CHAIN_GRADES = [30, 43, 70, 80, 100] as const;

/**
 * A grade that is a column of the chain table.
 *
 * @example
 * const g: ChainGrade = 70;
 */
export type ChainGrade = (typeof CHAIN_GRADES)[number];

/**
 * The trade name of each grade as the table heads it.
 *
 * @example
 * GRADE_NAMES[30]; // "grade 30 proof coil"
 */
export const GRADE_NAMES: Readonly<Record<ChainGrade, string>> = {
  30: "grade 30 proof coil",
  43: "grade 43 high test",
  70: "grade 70 transport",
  80: "grade 80 alloy",
  100: "grade 100 alloy",
};

// 49 CFR 393.108, chain mark examples (JJK-108 copy, verified).
const MARKS: Readonly<Record<string, ChainGrade>> = {
  "3": 30, "30": 30, "300": 30,
  "4": 43, "43": 43, "430": 43,
  "7": 70, "70": 70, "700": 70,
  "8": 80, "80": 80, "800": 80,
  "10": 100, "100": 100, "1000": 100,
};

/**
 * A grade as received: a number (70), or text ("70", "G70", "grade 70", "g7").
 *
 * @example
 * const g: GradeInput = "G70";
 */
export type GradeInput = number | string;

/**
 * Reads a grade. The stamped mark forms (7, 70, 700) all give the table grade (70); a
 * grade that is not a table column comes back as its number (e.g. 120), so a caller can
 * say it is not in the table. Returns `undefined` when the text is not a grade at all.
 *
 * @example
 * parseGrade("G7");      // 70
 * parseGrade(700);       // 70
 * parseGrade("grade 100"); // 100
 * parseGrade(120);       // 120 (not a table column)
 * parseGrade("alloy");   // undefined
 */
export function parseGrade(input: GradeInput): number | undefined {
  const text = String(input).trim().toLowerCase().replace(/^(?:grade|gr\.?|g)\s*/, "");
  if (!/^\d+$/.test(text)) return undefined;
  const mapped = MARKS[String(Number(text))];
  if (mapped !== undefined) return mapped;
  const n = Number(text);
  return n > 0 ? n : undefined;
}

/**
 * Whether a number is a grade column of the chain table.
 *
 * @example
 * isChainGrade(80); // true
 * isChainGrade(120); // false
 */
export function isChainGrade(grade: number | undefined): grade is ChainGrade {
  return (CHAIN_GRADES as readonly number[]).includes(grade as number);
}
