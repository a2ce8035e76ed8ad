package org.oedometry.fitting;

/**
 * A valid curve that does not admit the requested construction or fit, with a reason a technician
 * understands (for example "no inflection on the log-time curve: primary consolidation may not be
 * complete").
 *
 * <p>Unchecked. Invalid input (NaN, a non-positive drainage path, too few readings) is an {@link
 * IllegalArgumentException} instead; a doubtful but usable result carries a warning instead.
 */
public final class FitException extends RuntimeException {

  private static final long serialVersionUID = 1L;

  /**
   * Creates the exception.
   *
   * @param reason why no honest result exists, in words a technician understands; not blank
   * @throws IllegalArgumentException if the reason is null or blank
   */
  public FitException(String reason) {
    super(requireReason(reason));
  }

  /**
   * Creates the exception, keeping the failure of a numerical library that caused it.
   *
   * @param reason why no honest result exists; not blank
   * @param cause the underlying failure, for the stack trace
   * @throws IllegalArgumentException if the reason is null or blank
   */
  public FitException(String reason, Throwable cause) {
    super(requireReason(reason), cause);
  }

  private static String requireReason(String reason) {
    if (reason == null || reason.isBlank()) {
      throw new IllegalArgumentException("reason of a FitException must not be blank");
    }
    return reason;
  }
}
