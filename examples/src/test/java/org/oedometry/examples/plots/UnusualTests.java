package org.oedometry.examples.plots;

import java.util.ArrayList;
import java.util.List;
import org.oedometry.core.LoadIncrement;
import org.oedometry.core.OedometerTest;
import org.oedometry.core.SettlementCurve;
import org.oedometry.core.Specimen;
import org.oedometry.core.TestIdentifiers;
import org.oedometry.fitting.synthetic.ReadingSchedules;
import org.oedometry.theory.ConsolidationCurveModel;
import org.oedometry.theory.CurveParameters;
import org.oedometry.theory.Drainage;

/**
 * Legal tests of unusual shape, INVENTED for the chart tests: exact Terzaghi curves ({@link
 * ConsolidationCurveModel}, no noise) with 5 % initial compression and a secondary slope of 3 % of
 * the primary compression per log cycle, c<sub>v</sub> 3 m<sup>2</sup>/yr, double drainage, on the
 * usual lab schedule with a zero reading (or a data logger's).
 */
final class UnusualTests {

  static final double YEAR = 365.25 * 86_400;

  private UnusualTests() {}

  /** A test whose only increment unloads (swelling) from 100 to 50 kPa. */
  static OedometerTest oneSwellingIncrement() {
    return of(lab(), new double[] {100e3, 50e3}, new double[] {-0.05});
  }

  /** The shapes the chart gallery must survive, with their names. */
  static List<Object[]> shapes() {
    return List.of(
        new Object[] {"one increment", of(lab(), new double[] {25e3, 50e3}, new double[] {0.15})},
        new Object[] {
          "load, unload, reload",
          of(
              lab(),
              new double[] {25e3, 50e3, 100e3, 200e3, 400e3, 100e3, 25e3, 100e3, 400e3, 800e3},
              new double[] {0.15, 0.45, 0.9, 0.8, -0.08, -0.06, 0.05, 0.1, 0.7})
        },
        new Object[] {"one swelling increment", oneSwellingIncrement()},
        new Object[] {
          "readings that never move",
          of(lab(), new double[] {25e3, 50e3, 100e3}, new double[] {0, 0})
        },
        new Object[] {
          "stresses near 1e-306 Pa",
          of(lab(), new double[] {2e-306, 4e-306, 8e-306}, new double[] {0.45, 0.9})
        },
        new Object[] {
          "stresses near 1e300 Pa",
          of(lab(), new double[] {1e300, 2e300, 4e300}, new double[] {0.45, 0.9})
        },
        new Object[] {
          "8,640-reading data logger (every 10 s for 24 h)",
          of(
              ReadingSchedules.withZeroReading(ReadingSchedules.uniform(10, 86_400)),
              new double[] {50e3, 100e3},
              new double[] {0.45})
        });
  }

  static double[] lab() {
    return ReadingSchedules.withZeroReading(ReadingSchedules.usualLab());
  }

  /** Increments between the stresses (Pa) with the primary compression (mm) of each. */
  static OedometerTest of(double[] times, double[] stresses, double[] primaryMm) {
    List<LoadIncrement> increments = new ArrayList<>();
    double height = 0.020;
    for (int j = 0; j < primaryMm.length; j++) {
      double dp = primaryMm[j] / 1000;
      double[] d = new double[times.length];
      if (dp != 0) {
        ConsolidationCurveModel model =
            ConsolidationCurveModel.of(Drainage.DOUBLE.drainagePath(height));
        CurveParameters p = CurveParameters.of(0.05 * dp, dp, 3 / YEAR, 0.03 * dp);
        for (int k = 1; k < times.length; k++) {
          d[k] = model.settlement(times[k], p);
        }
      }
      SettlementCurve curve = SettlementCurve.of(times, d);
      increments.add(LoadIncrement.of(stresses[j], stresses[j + 1], curve));
      height -= curve.finalSettlementMetres();
    }
    Specimen specimen =
        Specimen.builder()
            .initialHeight(0.020)
            .diameter(0.075)
            .specificGravity(2.70)
            .dryMass(0.1150)
            .initialWaterContent(0.38)
            .build();
    return OedometerTest.builder(specimen)
        .identifiers(
            TestIdentifiers.of("Invented unusual test, for chart tests", "BH-X", "S-X", "4 m"))
        .increments(increments)
        .build();
  }
}
