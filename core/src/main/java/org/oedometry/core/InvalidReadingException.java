package org.oedometry.core;

/**
 * A reading that the test as a whole cannot accept: with the specimen's height at the start of its
 * increment it gives a height at or below the height of solids (a void ratio &le; 0) or beyond the
 * range of a double. Thrown by {@link OedometerTest}'s construction; it carries the position of the
 * reading so that a program can point at it (the CSV reader names the file's line).
 */
public final class InvalidReadingException extends IllegalArgumentException {

  private static final long serialVersionUID = 1L;

  /** Index of the increment, 0-based. */
  private final int incrementIndex;

  /** Index of the reading in its increment's curve, 0-based. */
  private final int readingIndex;

  /**
   * Creates the exception.
   *
   * @param message what is wrong, naming the reading and the values
   * @param incrementIndex index of the increment, 0-based, &ge; 0
   * @param readingIndex index of the reading in that increment's curve, 0-based, &ge; 0
   * @throws IllegalArgumentException if an index is negative
   */
  public InvalidReadingException(String message, int incrementIndex, int readingIndex) {
    super(message);
    if (incrementIndex < 0 || readingIndex < 0) {
      throw new IllegalArgumentException(
          "increment index ("
              + incrementIndex
              + ") and reading index ("
              + readingIndex
              + ") must be >= 0");
    }
    this.incrementIndex = incrementIndex;
    this.readingIndex = readingIndex;
  }

  /**
   * The increment that holds the reading.
   *
   * @return its index in {@link OedometerTest#increments()}, 0-based
   */
  public int incrementIndex() {
    return incrementIndex;
  }

  /**
   * The reading.
   *
   * @return its index in the increment's {@link SettlementCurve}, 0-based
   */
  public int readingIndex() {
    return readingIndex;
  }
}
