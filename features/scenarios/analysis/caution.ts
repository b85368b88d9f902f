/** The standing caution beside every forecast (brief §8), in Patchcast's words. */
export const FORECAST_CAUTION =
  'These numbers are model output under a stationary Markov assumption, estimated from limited data; they are not ' +
  'predictions of what will happen on the ground. Check them against field monitoring, keep the data and matrix ' +
  "behind them with every chart, and follow the land-management agency's guidance and local regulations before acting on them.";
