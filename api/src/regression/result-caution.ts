/** Shown with every statistical result the API returns (and repeated by the console and the SDK docs). */
export const RESULT_CAUTION =
  'Statistical estimates under the stated model assumptions and covariance choice; check the diagnostics before relying on them. ' +
  "Not financial advice: follow your organisation's model-risk and licensed-practice rules before acting on these numbers.";
