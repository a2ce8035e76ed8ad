package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.SplittableRandom;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.fitting.internal.LineFit;
import org.oedometry.fitting.internal.MonotoneCubic;

/**
 * The log-time scan computes its local slopes four centres at a time (interleaved sums, for speed).
 * Each must be the slope of the least-squares line through the same window, bit for bit: {@link
 * LineFit#of} is the reference (the textbook two-pass formula, S<sub>xy</sub> / S<sub>xx</sub>
 * about the means, from memory), and the interleaving must not change the order of any sum (IEEE
 * 754: floating-point addition is not associative, so only the same order gives the same bits).
 */
class LogTimeLocalSlopesTest {

  @Test
  @DisplayName(
      "every local slope of the scan equals LineFit's slope of its window, bit for bit, on 300"
          + " random invented curves mixing dense (readings) and sparse (interpolant) windows")
  void interleavedSlopesEqualTheLineFit() {
    SplittableRandom random = new SplittableRandom(2026_12_02L);
    int checked = 0;
    for (int curve = 0; curve < 300; curve++) {
      // Readings on log10 t: a sparse stretch, a dense stretch (a data logger switched on), sparse.
      int n = 10 + random.nextInt(200);
      double[] x = new double[n];
      double[] y = new double[n];
      double at = random.nextDouble();
      for (int i = 0; i < n; i++) {
        boolean dense = i > n / 3 && i < 2 * n / 3;
        at += dense ? 0.001 + 0.01 * random.nextDouble() : 0.05 + 0.3 * random.nextDouble();
        x[i] = at;
        y[i] = (i > 0 ? y[i - 1] : 0) + random.nextDouble() * 1e-5;
      }
      MonotoneCubic cubic = MonotoneCubic.of(x, y);
      LogTimeMethod.LocalFitter fitter = new LogTimeMethod.LocalFitter(x, y, cubic);
      double step = LogTimeMethod.GRID_STEP;
      int centres = (int) Math.floor((x[n - 1] - x[0]) / step) + 1;
      boolean[] dense = new boolean[centres];
      int[] from = new int[centres];
      int[] to = new int[centres];
      double[] slopes = new double[centres];
      int[] lo = new int[centres];
      int[] hi = new int[centres];
      for (int k = 0; k < centres; k++) {
        double c = x[0] + k * step;
        lo[k] = k > 0 ? lo[k - 1] : 0;
        hi[k] = k > 0 ? hi[k - 1] : 0;
        while (lo[k] < n && x[lo[k]] < c - LogTimeMethod.WINDOW_HALF_WIDTH) {
          lo[k]++;
        }
        while (hi[k] < n && x[hi[k]] <= c + LogTimeMethod.WINDOW_HALF_WIDTH) {
          hi[k]++;
        }
        fitter.window(c, lo[k], hi[k], k, dense, from, to);
      }
      fitter.slopes(dense, from, to, slopes);
      for (int k = 0; k < centres; k++) {
        // fit() is LineFit.of on the same window (the readings or the sampled interpolant).
        assertThat(slopes[k])
            .as("curve %d centre %d", curve, k)
            .isEqualTo(fitter.fit(x[0] + k * step, lo[k], hi[k]).slope());
        checked++;
      }
    }
    assertThat(checked).isGreaterThan(10_000);
  }
}
