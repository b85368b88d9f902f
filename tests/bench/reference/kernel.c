/*
 * C reference for the Patchcast kernel benchmark (tests/bench/kernel.bench.ts): the same loop as
 * shared/markov/kernel.ts — blocks of 4,096 patches, each with its own xoshiro128** stream
 * (Blackman & Vigna, https://prng.di.unimi.it/xoshiro128starstar.c), one raw 32-bit draw per patch
 * per step, a 2^10-bin lookup table per row with an exact threshold fallback, per-step counts and
 * area totals per block. Block streams are seeded with splitmix32 here (the seeding is outside the
 * timed loop and does not change the work). Usage: kernel N T; prints patch-steps per second of wall
 * time and of this process's CPU time (the machine may be shared).
 */
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>

#define K 5
#define BITS 10
#define BLOCK 4096

static const double P[K][K] = {
  {0.60, 0.15, 0.10, 0.10, 0.05}, {0.20, 0.50, 0.15, 0.10, 0.05}, {0.05, 0.05, 0.80, 0.05, 0.05},
  {0.10, 0.20, 0.30, 0.30, 0.10}, {0.30, 0.10, 0.10, 0.10, 0.40}};

static inline uint32_t rotl(uint32_t x, int k) { return (x << k) | (x >> (32 - k)); }

static uint32_t splitmix32(uint32_t *x) {
  uint32_t z = (*x += 0x9e3779b9u);
  z = (z ^ (z >> 16)) * 0x85ebca6bu;
  z = (z ^ (z >> 13)) * 0xc2b2ae35u;
  return z ^ (z >> 16);
}

int main(int argc, char **argv) {
  long n = argc > 1 ? atol(argv[1]) : 1000000;
  int steps = argc > 2 ? atoi(argv[2]) : 100;
  int slots = steps + 1;
  long blocks = (n + BLOCK - 1) / BLOCK;
  uint8_t table[K << BITS];
  double thr[K * K];
  for (int i = 0; i < K; i++) {
    double cum = 0;
    for (int j = 0; j < K; j++) {
      cum += P[i][j];
      thr[i * K + j] = j == K - 1 ? 4294967296.0 : __builtin_ceil(cum * 4294967296.0);
    }
    int j = 0;
    for (uint32_t b = 0; b < (1u << BITS); b++) {
      double first = (double)b * (1u << (32 - BITS)), lastv = first + (1u << (32 - BITS)) - 1;
      while (first >= thr[i * K + j]) j++;
      table[(i << BITS) | b] = lastv < thr[i * K + j] ? j : 0x80 + j;
    }
  }
  uint8_t *state = calloc(n, 1);
  double *area = malloc(n * sizeof(double));
  double *counts = calloc((size_t)slots * K, sizeof(double));
  double *sums = calloc((size_t)blocks * slots * K, sizeof(double));
  for (long i = 0; i < n; i++) { area[i] = 900.0; state[i] = i % K; }
  struct timespec t0, t1, c0, c1;
  clock_gettime(CLOCK_MONOTONIC, &t0);
  clock_gettime(CLOCK_PROCESS_CPUTIME_ID, &c0);
  for (long b = 0; b < blocks; b++) {
    uint32_t seed = (uint32_t)b, s0 = splitmix32(&seed), s1 = splitmix32(&seed), s2 = splitmix32(&seed), s3 = splitmix32(&seed);
    long lo = b * BLOCK, hi = lo + BLOCK < n ? lo + BLOCK : n;
    for (int s = 1; s < slots; s++) {
      double *c = counts + s * K, *a = sums + (b * slots + s) * K;
      for (long i = lo; i < hi; i++) {
        uint32_t r = rotl(s1 * 5, 7) * 9, t = s1 << 9;
        s2 ^= s0; s3 ^= s1; s1 ^= s2; s0 ^= s3; s2 ^= t; s3 = rotl(s3, 11);
        uint32_t row = state[i];
        uint32_t j = table[(row << BITS) | (r >> (32 - BITS))];
        if (j >= 0x80) { j -= 0x80; while ((double)r >= thr[row * K + j]) j++; }
        state[i] = (uint8_t)j;
        c[j] += 1;
        a[j] += area[i];
      }
    }
  }
  clock_gettime(CLOCK_PROCESS_CPUTIME_ID, &c1);
  clock_gettime(CLOCK_MONOTONIC, &t1);
  double seconds = (t1.tv_sec - t0.tv_sec) + (t1.tv_nsec - t0.tv_nsec) * 1e-9;
  double cpu = (c1.tv_sec - c0.tv_sec) + (c1.tv_nsec - c0.tv_nsec) * 1e-9;
  double check = 0;
  for (int j = 0; j < K; j++) check += counts[steps * K + j];
  printf("{\"patchStepsPerSecond\": %.0f, \"cpuPatchStepsPerSecond\": %.0f, \"check\": %.0f}\n", (double)n * steps / seconds, (double)n * steps / cpu, check);
  return 0;
}
