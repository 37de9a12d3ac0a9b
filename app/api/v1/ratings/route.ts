import { AppError } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { defaultRating, RatingError, ratingQuerySchema } from "@/lib/securement";

// The default WLL of unmarked tiedown material from the 49 CFR 393.108 tables, e.g.
// GET /api/v1/ratings?material=chain&grade=70&size=3/8%20in. A size or grade that the table
// does not have is a 404 naming the nearest sizes; other lookups that cannot be answered are 400.
export const GET = route("securement.check", { query: ratingQuerySchema }, async ({ query }) => {
  try {
    return defaultRating(query);
  } catch (error) {
    if (!(error instanceof RatingError)) throw error;
    const status = error.code === "SIZE_NOT_IN_TABLE" || error.code === "UNKNOWN_GRADE" ? 404 : 400;
    throw new AppError(status, error.message, [{ path: error.field ?? "", message: error.message }], {
      code: error.code,
      nearest: [...error.nearest],
    });
  }
});
