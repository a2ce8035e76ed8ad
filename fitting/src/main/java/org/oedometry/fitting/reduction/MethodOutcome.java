package org.oedometry.fitting.reduction;

import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import org.oedometry.core.compressibility.Derived;
import org.oedometry.fitting.CvEstimate;
import org.oedometry.fitting.CvMethod;

/**
 * What one c<sub>v</sub> method gave for one increment: its estimate (with the drainage path it
 * used and its own warnings) or the reason it gave none, and the permeability k = c<sub>v</sub>
 * m<sub>v</sub> &gamma;<sub>w</sub> from that c<sub>v</sub>.
 *
 * @param method the method
 * @param estimate the method's full result (cast to its record, e.g. {@link
 *     org.oedometry.fitting.LogTimeResult}, for the construction geometry); empty when the method
 *     gave no value
 * @param failureReason why the method gave no value, in words a technician understands; the empty
 *     string when it gave one
 * @param permeability k from this c<sub>v</sub>, m/s, or why it is absent
 */
public record MethodOutcome(
    CvMethod method,
    Optional<CvEstimate> estimate,
    String failureReason,
    Derived<Double> permeability) {

  /**
   * Validates the outcome.
   *
   * @param method the method; not null
   * @param estimate the result, or empty; not null; its method must be {@code method}
   * @param failureReason empty when the estimate is present, otherwise not blank
   * @param permeability k, m/s, or why it is absent; not null
   * @throws IllegalArgumentException if the estimate and reason are both given or both missing, or
   *     the estimate is of another method
   * @throws NullPointerException if an argument is null
   */
  public MethodOutcome {
    Objects.requireNonNull(method, "method");
    Objects.requireNonNull(estimate, "estimate");
    Objects.requireNonNull(failureReason, "failure reason");
    Objects.requireNonNull(permeability, "permeability");
    if (estimate.isPresent() == !failureReason.isBlank()) {
      throw new IllegalArgumentException(
          "a method outcome needs either an estimate or a failure reason, not both ("
              + method
              + ")");
    }
    if (estimate.isPresent() && estimate.get().method() != method) {
      throw new IllegalArgumentException(
          "estimate of " + estimate.get().method() + " given as the outcome of " + method);
    }
  }

  /**
   * The coefficient of consolidation.
   *
   * @return c<sub>v</sub>, m^2/s, or empty when the method gave no value
   */
  public OptionalDouble cv() {
    return estimate.isPresent() ? OptionalDouble.of(estimate.get().cv()) : OptionalDouble.empty();
  }
}
