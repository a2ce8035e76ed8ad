package org.oedometry.core;

import org.oedometry.core.internal.Checks;

/**
 * Free-text labels that identify a test: project, borehole, sample and depth. Any may be empty.
 *
 * <p>Surrounding white space is removed. Rejected, so that every label fits on one line of a report
 * or CSV file and reads in its own order there: control characters (line breaks, tabs), the Unicode
 * line and paragraph separators U+2028 and U+2029, the bidirectional formatting controls (U+061C,
 * U+200E, U+200F, U+202A to U+202E, U+2066 to U+2069), which would reorder the rest of a report
 * line, and unpaired surrogates, which no file encoding can carry. The depth is text on purpose
 * ("4.50-4.95 m", "U12 top"): the library does not compute with it.
 *
 * @param project project name or number
 * @param borehole borehole or trial pit
 * @param sample sample reference
 * @param depth depth of the sample, as written by the laboratory
 */
public record TestIdentifiers(String project, String borehole, String sample, String depth) {

  /**
   * Validates and strips the labels.
   *
   * @param project project name or number
   * @param borehole borehole or trial pit
   * @param sample sample reference
   * @param depth depth of the sample, as written by the laboratory
   * @throws IllegalArgumentException if a label contains a character the class description rejects;
   *     the message names the label, the character's code and its index
   * @throws NullPointerException if a label is null
   */
  public TestIdentifiers {
    project = Checks.plainText(project, "project");
    borehole = Checks.plainText(borehole, "borehole");
    sample = Checks.plainText(sample, "sample");
    depth = Checks.plainText(depth, "depth");
  }

  /**
   * Labels that are all empty.
   *
   * @return empty labels
   */
  public static TestIdentifiers none() {
    return new TestIdentifiers("", "", "", "");
  }

  /**
   * Creates labels.
   *
   * @param project project name or number; not null
   * @param borehole borehole or trial pit; not null
   * @param sample sample reference; not null
   * @param depth depth as text; not null
   * @return the labels
   * @throws IllegalArgumentException if a label contains a character the class description rejects;
   *     the message names the label, the character's code and its index
   * @throws NullPointerException if a label is null
   */
  public static TestIdentifiers of(String project, String borehole, String sample, String depth) {
    return new TestIdentifiers(project, borehole, sample, depth);
  }
}
