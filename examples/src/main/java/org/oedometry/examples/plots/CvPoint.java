package org.oedometry.examples.plots;

import java.util.Locale;
import java.util.Optional;
import org.oedometry.core.compressibility.IncrementClass;
import org.oedometry.core.compressibility.IncrementCompressibility;
import org.oedometry.fitting.CvEstimate;
import org.oedometry.fitting.CvMethod;
import org.oedometry.fitting.reduction.IncrementReport;

/**
 * One point of the c<sub>v</sub> &ndash; log &sigma;' chart: one increment's c<sub>v</sub> by one
 * method, at the increment's mid stress, with the increment's class where it is known.
 *
 * @param stress the stress at which c<sub>v</sub> is plotted (usually the logarithmic mean
 *     &radic;(&sigma;'<sub>1</sub>&sigma;'<sub>2</sub>) of the increment), Pa; finite, &gt; 0
 * @param cv coefficient of consolidation, m<sup>2</sup>/s; finite, &gt; 0
 * @param method the method that gave it; not null
 * @param stressHistory the increment's class relative to &sigma;'<sub>p</sub>, or empty where it is
 *     not known (no &sigma;'<sub>p</sub> was found, as for a test of a single increment); not null
 */
public record CvPoint(
    double stress, double cv, CvMethod method, Optional<IncrementClass> stressHistory) {

  /**
   * Validates the point.
   *
   * @param stress Pa; finite, &gt; 0
   * @param cv m<sup>2</sup>/s; finite, &gt; 0
   * @param method not null
   * @param stressHistory the increment's class, or empty where it is not known; not null
   * @throws IllegalArgumentException if a number is not finite and positive or the method or class
   *     is null
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
    if (stressHistory == null) {
      throw new IllegalArgumentException("stress history must not be null (empty if not known)");
    }
  }

  /**
   * The point of one increment and one estimate: the increment's logarithmic mean stress (the
   * arithmetic mean if it starts from zero stress) and its class, which {@link
   * org.oedometry.core.compressibility.Compressibility#increments} found against the &sigma;'<sub>p
   * </sub> it was given.
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
        Optional.of(increment.stressHistory()));
  }

  /**
   * The point of one row of a reduction report and one estimate: the increment's logarithmic mean
   * stress (the arithmetic mean if it starts from zero stress) and the report's class of it ({@link
   * IncrementReport#stressHistory()}), empty where the report could not class it because no
   * construction found &sigma;'<sub>p</sub>.
   *
   * @param increment the report's row; not null, with its compressibility present
   * @param estimate a c<sub>v</sub> estimate of that increment; not null
   * @return the point
   * @throws IllegalArgumentException if an argument is null or the row has no compressibility
   */
  public static CvPoint of(IncrementReport increment, CvEstimate estimate) {
    if (increment == null || estimate == null) {
      throw new IllegalArgumentException("increment and estimate must not be null");
    }
    IncrementCompressibility compressibility =
        increment
            .compressibility()
            .value()
            .orElseThrow(
                () ->
                    new IllegalArgumentException(
                        "increment at index "
                            + increment.index()
                            + " has no compressibility, so no mid stress: "
                            + increment.compressibility().absenceReason()));
    return new CvPoint(
        compressibility.logMeanStress().orElse(compressibility.arithmeticMeanStress()),
        estimate.cv(),
        estimate.method(),
        increment.stressHistory().value());
  }

  /**
   * Whether the increment is known to be overconsolidated throughout (recompression, reloading or
   * unloading).
   *
   * @return true only where the class is known and overconsolidated; false for a normally
   *     consolidated increment, one that crosses &sigma;'<sub>p</sub>, and one whose class is not
   *     known (see {@link #stressHistory()})
   */
  public boolean overconsolidated() {
    return stressHistory.map(IncrementClass::isOverconsolidated).orElse(false);
  }
}
