// The benchmark chain (invented, K = 5), the same as in tests/bench/reference/kernel.c and kernel_numpy.py.
export const BENCH_STATES = ['Shrub steppe', 'Perennial grass', 'Annual grass', 'Bare soil', 'Juniper'];
export const BENCH_ROWS = [
  [0.6, 0.15, 0.1, 0.1, 0.05],
  [0.2, 0.5, 0.15, 0.1, 0.05],
  [0.05, 0.05, 0.8, 0.05, 0.05],
  [0.1, 0.2, 0.3, 0.3, 0.1],
  [0.3, 0.1, 0.1, 0.1, 0.4],
];
