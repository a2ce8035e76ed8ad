package org.oedometry.examples.plots;

import org.oedometry.core.OedometerTest;
import org.oedometry.core.SettlementCurve;
import org.oedometry.examples.demo.DemoTestGenerator;

/**
 * One increment of the invented demo test (50 to 100 kPa, index 3) and its fits, computed once for
 * the chart tests, with the generator's true drainage path.
 */
final class DemoIncrement {

  static final int INDEX = 3;

  static final OedometerTest TEST = DemoTestGenerator.generate();

  static final SettlementCurve CURVE = TEST.increments().get(INDEX).curve();

  static final double DRAINAGE_PATH = DemoTestGenerator.truth().get(INDEX).drainagePathMetres();

  private DemoIncrement() {}
}
