package org.oedometry.core;

import org.oedometry.core.internal.Checks;

/**
 * Free-text labels that identify a test: project, borehole, sample and depth. Any may be empty.
 *
 * <p>Surrounding white space is removed; control characters (line breaks, tabs) are rejected so
 * that every label fits on one line of a report or CSV file. The depth is text on purpose
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
   * @throws IllegalArgumentException if a label contains a control character
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
   * @throws IllegalArgumentException if a label contains a control character
   * @throws NullPointerException if a label is null
   */
  public static TestIdentifiers of(String project, String borehole, String sample, String depth) {
    return new TestIdentifiers(project, borehole, sample, depth);
  }
}
