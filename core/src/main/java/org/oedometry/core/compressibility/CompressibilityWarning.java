package org.oedometry.core.compressibility;

/**
 * A typed warning with a message a technician understands. A warning never replaces an error.
 *
 * @param kind what sort of warning
 * @param message what happened, with the numbers
 */
public record CompressibilityWarning(WarningKind kind, String message) {

  /**
   * Validates the warning.
   *
   * @param kind what sort of warning
   * @param message what happened, with the numbers
   * @throws IllegalArgumentException if an argument is null
   */
  public CompressibilityWarning {
    Checks.notNull("kind", kind);
    Checks.notNull("message", message);
  }
}
