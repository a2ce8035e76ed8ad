package org.oedometry.core;

/** How a displacement gauge (dial gauge or transducer) moves when the specimen compresses. */
public enum GaugeDirection {
  /** The reading grows as the specimen gets thinner. */
  INCREASES_WITH_COMPRESSION,
  /** The reading falls as the specimen gets thinner. */
  DECREASES_WITH_COMPRESSION;

  /**
   * The sign that turns gauge travel into settlement.
   *
   * @return +1 for {@link #INCREASES_WITH_COMPRESSION}, -1 for {@link #DECREASES_WITH_COMPRESSION}
   */
  public int sign() {
    return this == INCREASES_WITH_COMPRESSION ? 1 : -1;
  }
}
