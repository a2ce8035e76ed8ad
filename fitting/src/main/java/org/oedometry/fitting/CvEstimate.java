package org.oedometry.fitting;

import java.util.List;

/**
 * What every per-increment c<sub>v</sub> method returns, whatever else its result holds: the
 * method, c<sub>v</sub>, the drainage path used and the warnings. Lets a program compare methods or
 * feed any of them into the derivation of k.
 *
 * <p>Results feed engineering decisions and must be reviewed by a qualified engineer; local codes
 * and standards govern.
 */
public interface CvEstimate {

  /**
   * The method that produced this estimate.
   *
   * @return the method
   */
  CvMethod method();

  /**
   * Coefficient of consolidation.
   *
   * @return c<sub>v</sub>, m<sup>2</sup>/s, finite and &gt; 0
   */
  double cv();

  /**
   * The drainage path the estimate used.
   *
   * @return H<sub>dr</sub>, m
   */
  double drainagePath();

  /**
   * Doubts about the estimate.
   *
   * @return the warnings; empty when there are none
   */
  List<FitWarning> warnings();

  /**
   * Whether a warning of the given kind was raised.
   *
   * @param kind a kind
   * @return true if {@link #warnings()} holds one of that kind
   */
  default boolean hasWarning(FitWarning.Kind kind) {
    return warnings().stream().anyMatch(w -> w.is(kind));
  }
}
