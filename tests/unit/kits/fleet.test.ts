// Entry point of the kit builder's pure tests beside plan.test.ts (lib/kits/**): one file per
// module as `<module>.suite.ts`, imported here so that vitest starts one worker for them all.
import "./quantities.suite";
import "./display.suite";
import "./schemas.suite";
import "./matching.suite";
import "./lifecycle.suite";
import "./answers.suite";
