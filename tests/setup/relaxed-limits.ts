/**
 * Rate limits high enough that the test suites and the benchmark, which sign in and post far faster than a person,
 * never meet them. The rate-limit tests set their own.
 */
export const relaxedRateLimits = {
  RATE_LIMIT_API_PER_MINUTE: '1000000',
  RATE_LIMIT_MESSAGES_PER_HOUR: '100000',
  RATE_LIMIT_DRAFTS_PER_HOUR: '100000',
  RATE_LIMIT_UPLOADS_PER_HOUR: '100000',
  RATE_LIMIT_SIGN_INS_PER_HOUR: '100000',
  RATE_LIMIT_INSPECTOR_PER_HOUR: '100000',
  RATE_LIMIT_INSPECTOR_OUTCOMES_PER_HOUR: '100000',
};
