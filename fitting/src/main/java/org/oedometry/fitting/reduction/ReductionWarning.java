package org.oedometry.fitting.reduction;

import java.util.Objects;
import java.util.Optional;
import org.oedometry.fitting.CvMethod;
import org.oedometry.fitting.FitWarning;

/**
 * A doubt about one increment of a reduced test: from one c<sub>v</sub> method (that method's own
 * warning) or from the reduction itself (methods disagree, a method gave no value, a fallback).
 *
 * @param method the method that raised it; empty when the reduction raised it
 * @param warning the kind and the details
 */
public record ReductionWarning(Optional<CvMethod> method, FitWarning warning) {

  /**
   * Validates the warning.
   *
   * @param method the method that raised it, or empty; not null
   * @param warning the kind and details; not null
   * @throws NullPointerException if an argument is null
   */
  public ReductionWarning {
    Objects.requireNonNull(method, "method");
    Objects.requireNonNull(warning, "warning");
  }

  /**
   * The kind of the warning.
   *
   * @return the kind
   */
  public FitWarning.Kind kind() {
    return warning.kind();
  }

  /**
   * The message with its source, for a technician.
   *
   * @return e.g. "root-time (Taylor): the readings chosen for the early line ..."
   */
  public String message() {
    return method.map(m -> m.label() + ": ").orElse("") + warning.message();
  }
}
