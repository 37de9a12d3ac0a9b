/**
 * Welded steel chain grades: the columns of the 49 CFR 393.108 chain table and the way the
 * grade is stamped on links.
 *
 * Mark examples (49 CFR 393.108, chain table notes, JJK-108 copy, verified): grade 30 is
 * marked 3, 30 or 300; grade 43: 4, 43 or 430; grade 70: 7, 70 or 700; grade 80: 8, 80 or
 * 800; grade 100: 10, 100 or 1000. Grade 43 is also stamped 40 or 400: the New York State
 * cargo manual's copy of the table prints G43 as 4 / 40 / 400, and grade 40 is a common
 * stamp for high-test chain in the trade (shared reference §1.4). Those marks are read as
 * grade 43 and the reader says so ({@link gradeMarkNote}); they are never refused.
 *
 * @module
 */
import { boundedMemo, shortKey } from "../memo";

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

// 49 CFR 393.108, chain mark examples (JJK-108 copy, verified); 40 and 400 for grade 43:
// New York State cargo manual's copy of the table, and the trade's stamp for high test.
const MARKS: Readonly<Record<string, ChainGrade>> = {
  "3": 30, "30": 30, "300": 30,
  "4": 43, "43": 43, "430": 43, "40": 43, "400": 43,
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
 * parseGrade("G40");     // 43 (grade 43 is also stamped 40; see gradeMarkNote)
 * parseGrade(120);       // 120 (not a table column)
 * parseGrade("alloy");   // undefined
 */
export function parseGrade(input: GradeInput): number | undefined {
  const mark = markDigits(input);
  if (mark === undefined) return undefined;
  const mapped = MARKS[mark];
  if (mapped !== undefined) return mapped;
  const n = Number(mark);
  return n > 0 ? n : undefined;
}

function readMark(input: GradeInput): string | undefined {
  const text = String(input).trim().toLowerCase().replace(/^(?:grade|gr\.?|g)\s*/, "");
  return /^\d+$/.test(text) ? String(Number(text)) : undefined;
}

// A check reads the same grade ("70", "G70") several times per tiedown (the schema, the
// description, the table, the fittings): each reading is kept (a text, which nothing can change).
const markDigits = boundedMemo(readMark, { limit: 500, key: (input: GradeInput) => shortKey(input, 32) });

/** Marks that are read as another grade than their own number, and why. */
const READ_AS: Readonly<Record<string, string>> = {
  "40": "grade 43 (high test) chain is also stamped 4, 40 or 400",
  "400": "grade 43 (high test) chain is also stamped 4, 40 or 400",
};

/**
 * The note to show when a grade mark is read as another grade than its own number (40 and
 * 400 are read as grade 43); `undefined` for every other mark.
 *
 * @example
 * gradeMarkNote("G40"); // 'Grade mark "G40" is read as grade 43: grade 43 (high test) chain is also stamped 4, 40 or 400'
 * gradeMarkNote(70);    // undefined
 */
export function gradeMarkNote(input: GradeInput): string | undefined {
  const mark = markDigits(input);
  const why = mark === undefined ? undefined : READ_AS[mark];
  return why === undefined ? undefined : `Grade mark "${String(input).trim()}" is read as grade ${MARKS[mark!]}: ${why}`;
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
