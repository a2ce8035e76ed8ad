package org.oedometry.core.compressibility;

import java.util.Optional;

/**
 * A derived quantity that is either present or absent with a reason a technician understands, e.g.
 * "no normally consolidated increment". Valid input never makes a derivation throw; it makes it
 * absent.
 *
 * @param <T> the type of the derived value
 * @param value the value, or empty
 * @param absenceReason why the value is absent; the empty string when it is present
 */
public record Derived<T>(Optional<T> value, String absenceReason) {

  /**
   * Validates that exactly one of value and reason is given.
   *
   * @param value the value, or empty
   * @param absenceReason why the value is absent; the empty string when it is present
   * @throws IllegalArgumentException if an argument is null, or a value comes with a reason, or
   *     neither is given
   */
  public Derived {
    Checks.notNull("value", value);
    Checks.notNull("absence reason", absenceReason);
    if (value.isPresent() == !absenceReason.isEmpty()) {
      throw new IllegalArgumentException(
          "a derived quantity needs either a value or a non-empty absence reason, not both");
    }
  }

  /**
   * A present value.
   *
   * @param <T> the type of the value
   * @param value the value; not null
   * @return the present derivation
   * @throws IllegalArgumentException if the value is null
   */
  public static <T> Derived<T> of(T value) {
    return new Derived<>(Optional.of(Checks.notNull("value", value)), "");
  }

  /**
   * An absent value.
   *
   * @param <T> the type the value would have had
   * @param reason why it cannot be derived; not empty
   * @return the absent derivation
   * @throws IllegalArgumentException if the reason is null or empty
   */
  public static <T> Derived<T> absent(String reason) {
    Checks.notNull("absence reason", reason);
    if (reason.isEmpty()) {
      throw new IllegalArgumentException("absence reason must not be empty");
    }
    return new Derived<>(Optional.empty(), reason);
  }

  /**
   * Whether the value is present.
   *
   * @return true when derived
   */
  public boolean isPresent() {
    return value.isPresent();
  }
}
