// Entry point of the securement engine's unit tests (lib/securement/**).
//
// The cases live in one file per engine module (`<module>.suite.ts` mirrors
// lib/securement/<module>.ts; check.properties.suite.ts holds the fast-check properties of
// checkSecurement) and are imported here. Vitest starts one worker per *.test.ts file, and
// on this project's 2-core machines each worker costs about a second before its first test:
// eleven test files took about 11 s where the tests themselves take about 1.5 s. One entry
// file keeps the whole suite at about 2.5 s.
// To run one module's cases: npx vitest run --project unit tests/unit/securement -t "<describe name>".
import "./units.suite";
import "./sizes.suite";
import "./grades.suite";
import "./tables.suite";
import "./lookup.suite";
import "./marking.suite";
import "./aggregate.suite";
import "./minimum.suite";
import "./assembly.suite";
import "./schema.suite";
import "./grouping.suite";
import "./check.suite";
import "./check.properties.suite";
