/*
 * The yardstick for `npm run bench` (docs/engine.md, speed): a plain value-only rollback of the
 * full CRR triangle for an American put, written the way a C programmer would, compiled with
 * gcc -O2. No decisions, boundaries or probabilities are recorded; the engine's default pass
 * records all three, so its time over this one says what that bookkeeping and JavaScript cost.
 *
 * Usage: american-put STEPS REPEATS — prints "value median_ms" for S = K = 100, r = 5 %,
 * σ = 30 %, T = 1 year (the bench's put).
 */
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <time.h>

static double rollback(int n, double *w) {
  const double s0 = 100, k = 100, r = 0.05, sigma = 0.3, t = 1;
  const double dt = t / n, u = exp(sigma * sqrt(dt)), d = 1 / u;
  const double p = (exp(r * dt) - d) / (u - d), disc = exp(-r * dt);
  const double up = disc * p, down = disc * (1 - p), ratio = u / d;
  double s = s0 * pow(d, n);
  for (int j = 0; j <= n; j++, s *= ratio) w[j] = k - s > 0 ? k - s : 0;
  for (int i = n - 1; i >= 0; i--) {
    s = s0 * pow(d, i); /* once per step, as the engine's lowest node */
    for (int j = 0; j <= i; j++, s *= ratio) {
      double hold = up * w[j + 1] + down * w[j];
      double now = k - s;
      w[j] = now > hold ? now : hold;
    }
  }
  return w[0];
}

static int ascending(const void *a, const void *b) {
  double x = *(const double *)a, y = *(const double *)b;
  return (x > y) - (x < y);
}

int main(int argc, char **argv) {
  if (argc != 3) return 2;
  int n = atoi(argv[1]), repeats = atoi(argv[2]);
  if (n < 1 || repeats < 1) return 2;
  double *w = malloc(sizeof(double) * (n + 1)), *times = malloc(sizeof(double) * repeats);
  double value = 0;
  for (int k = 0; k < 5; k++) value = rollback(n, w); /* warm caches, as the bench warms the JIT */
  for (int k = 0; k < repeats; k++) {
    struct timespec a, b;
    clock_gettime(CLOCK_MONOTONIC, &a);
    value = rollback(n, w);
    clock_gettime(CLOCK_MONOTONIC, &b);
    times[k] = (b.tv_sec - a.tv_sec) * 1e3 + (b.tv_nsec - a.tv_nsec) / 1e6;
  }
  qsort(times, repeats, sizeof(double), ascending);
  printf("%.12f %.6f\n", value, times[repeats / 2]);
  free(w);
  free(times);
  return 0;
}
