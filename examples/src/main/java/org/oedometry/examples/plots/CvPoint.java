package org.oedometry.examples.plots;

import java.util.Locale;
import org.oedometry.core.compressibility.IncrementCompressibility;
import org.oedometry.fitting.CvEstimate;
import org.oedometry.fitting.CvMethod;

/**
 * One point of the c<sub>v</sub> &ndash; log &sigma;' chart: one increment's c<sub>v</sub> by one
 * method, at the increment's mid stress.
 *
 * @param stress the stress at which c<sub>v</sub> is plotted (usually the logarithmic mean
 *     &radic;(&sigma;'<sub>1</sub>&sigma;'<sub>2</sub>) of the increment), Pa; finite, &gt; 0
 * @param cv coefficient of consolidation, m<sup>2</sup>/s; finite, &gt; 0
 * @param method the method that gave it; not null
 * @param overconsolidated whether the increment is overconsolidated throughout (recompression,
 *     reloading or unloading); false for a normally consolidated increment and for one that crosses
 *     the preconsolidation pressure
 */
public record CvPoint(double stress, double cv, CvMethod method, boolean overconsolidated) {

  /**
   * Validates the point.
   *
   * @param stress Pa; finite, &gt; 0
   * @param cv m<sup>2</sup>/s; finite, &gt; 0
   * @param method not null
   * @param overconsolidated the increment's class
   * @throws IllegalArgumentException if a number is not finite and positive or the method is null
   */
  public CvPoint {
    if (!(stress > 0) || stress == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException(
          String.format(Locale.ROOT, "stress (%s Pa) must be finite and > 0", stress));
    }
    if (!(cv > 0) || cv == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException(
          String.format(Locale.ROOT, "c_v (%s m^2/s) must be finite and > 0", cv));
    }
    if (method == null) {
      throw new IllegalArgumentException("method must not be null");
    }
  }

  /**
   * The point of one increment and one estimate: the increment's logarithmic mean stress (the
   * arithmetic mean if it starts from zero stress) and its class.
   *
   * @param increment the increment's compressibility; not null
   * @param estimate a c<sub>v</sub> estimate of that increment; not null
   * @return the point
   * @throws IllegalArgumentException if an argument is null
   */
  public static CvPoint of(IncrementCompressibility increment, CvEstimate estimate) {
    if (increment == null || estimate == null) {
      throw new IllegalArgumentException("increment and estimate must not be null");
    }
    return new CvPoint(
        increment.logMeanStress().orElse(increment.arithmeticMeanStress()),
        estimate.cv(),
        estimate.method(),
        increment.stressHistory().isOverconsolidated());
  }
}
