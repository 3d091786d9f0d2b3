/** Distribution of one figure over the samples of a scatter study. */
export interface Distribution {
  mean: number;
  std: number;
  min: number;
  max: number;
  p05: number;
  p50: number;
  p95: number;
  /** Equal-width histogram between min and max. */
  histogram: { from: number; to: number; counts: number[] };
}

/**
 * Mean, sample standard deviation (Welford's one-pass update; Knuth, TAOCP vol. 2, §4.2.2),
 * extremes, percentiles (linear interpolation between order statistics, "type 7" of Hyndman & Fan,
 * The American Statistician 50(4), 1996) and a histogram of `bins` bins. Sorts `values` in place.
 */
export function summarize(values: Float64Array, bins = 20): Distribution {
  const n = values.length;
  let mean = 0,
    m2 = 0;
  for (let i = 0; i < n; i++) {
    const d = values[i] - mean;
    mean += d / (i + 1);
    m2 += d * (values[i] - mean);
  }
  values.sort();
  const q = (p: number) => {
    const h = (n - 1) * p,
      lo = Math.floor(h),
      hi = Math.min(n - 1, lo + 1);
    return values[lo] + (h - lo) * (values[hi] - values[lo]);
  };
  const min = values[0],
    max = values[n - 1];
  const counts = new Array<number>(bins).fill(0);
  const width = (max - min) / bins;
  for (let i = 0; i < n; i++) counts[width > 0 ? Math.min(bins - 1, Math.floor((values[i] - min) / width)) : 0]++;
  return {
    mean,
    std: n > 1 ? Math.sqrt(m2 / (n - 1)) : 0,
    min,
    max,
    p05: q(0.05),
    p50: q(0.5),
    p95: q(0.95),
    histogram: { from: min, to: max, counts },
  };
}
