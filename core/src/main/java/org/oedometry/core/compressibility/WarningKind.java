package org.oedometry.core.compressibility;

/** The kinds of warning a compressibility derivation can attach to its result. */
public enum WarningKind {
  /** A straight line was fitted through only two points, so its R<sup>2</sup> says nothing. */
  TWO_POINT_LINE,
  /** A fitted straight line explains the points poorly (R<sup>2</sup> below 0.98). */
  POOR_LINE_FIT,
  /** The result lies outside the range of applied stresses. */
  OUTSIDE_TESTED_RANGE,
  /** A smoothing fit ended at a bound of its search range. */
  FIT_AT_BOUND,
  /**
   * Two construction lines meet outside the gap between the points each was fitted to (by more than
   * rounding: 1e-9 of the stress).
   */
  INTERSECTION_AWAY_FROM_BREAK,
  /** A ratio falls outside the range published as typical (a check, not an error). */
  OUTSIDE_TYPICAL_RANGE
}
