package org.oedometry.core.io;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.oedometry.core.DrainagePathRule;
import org.oedometry.core.LoadIncrement;
import org.oedometry.core.OedometerTest;
import org.oedometry.core.SettlementCurve;
import org.oedometry.core.Specimen;
import org.oedometry.core.TestIdentifiers;
import org.oedometry.theory.Drainage;

/**
 * Plain seeded generator of random valid tests (invented data) for the property tests. Values use
 * all the bits of a double, so an exact round trip is a real check.
 */
final class RandomOedometerTests {

  private static final String TEXT_CHARS = "abcXYZ 019,;\"'#-_./()é中";

  private RandomOedometerTests() {}

  static OedometerTest generate(long seed) {
    Random rnd = new Random(seed);
    double h0 = 0.01 + 0.02 * rnd.nextDouble();
    double e0 = 0.3 + 2.7 * rnd.nextDouble();
    double gs = rnd.nextInt(10) == 0 ? 1.5 + 3 * rnd.nextDouble() : 2.5 + 0.3 * rnd.nextDouble();
    Specimen.Builder b = Specimen.builder().initialHeight(h0).specificGravity(gs);
    double area;
    if (rnd.nextBoolean()) {
      double d = 0.05 + 0.05 * rnd.nextDouble();
      b.diameter(d);
      area = Math.PI * d * d / 4;
    } else {
      area = 0.002 + 0.006 * rnd.nextDouble();
      b.area(area);
    }
    if (rnd.nextBoolean()) {
      b.dryMass(h0 / (1 + e0) * gs * Specimen.WATER_DENSITY * area);
    } else {
      b.finalWaterContent(0.1 + 1.4 * rnd.nextDouble());
    }
    if (rnd.nextBoolean()) {
      double w0 = rnd.nextDouble();
      b.initialWaterContent(w0);
      if (rnd.nextBoolean()) {
        b.bulkDensity(gs * Specimen.WATER_DENSITY * (1 + w0) / (1.3 + 2 * rnd.nextDouble()));
      }
    }
    OedometerTest.Builder t = OedometerTest.builder(b.build());
    t.drainage(Drainage.values()[rnd.nextInt(2)]);
    t.drainagePathRule(DrainagePathRule.values()[rnd.nextInt(3)]);
    t.identifiers(TestIdentifiers.of(text(rnd), text(rnd), text(rnd), text(rnd)));
    int n = 1 + rnd.nextInt(5);
    double stress = rnd.nextBoolean() ? 0 : 1000 * rnd.nextDouble();
    for (int i = 0; i < n; i++) {
      double next;
      do {
        next = 1 + 1e6 * rnd.nextDouble();
      } while (next == stress);
      t.addIncrement(LoadIncrement.of(stress, next, curve(rnd)));
      stress = next;
    }
    return t.build();
  }

  private static SettlementCurve curve(Random rnd) {
    int size = 2 + rnd.nextInt(11);
    double[] time = new double[size];
    double[] settlement = new double[size];
    double t = rnd.nextBoolean() ? 0 : rnd.nextDouble();
    for (int i = 0; i < size; i++) {
      time[i] = t;
      t += 1e-3 + 1000 * rnd.nextDouble();
      settlement[i] = rnd.nextInt(20) == 0 ? -0.0 : -1e-4 + 4e-4 * rnd.nextDouble();
    }
    return SettlementCurve.of(time, settlement);
  }

  private static String text(Random rnd) {
    StringBuilder s = new StringBuilder();
    int length = rnd.nextInt(12);
    for (int i = 0; i < length; i++) {
      s.append(TEXT_CHARS.charAt(rnd.nextInt(TEXT_CHARS.length())));
    }
    return s.toString();
  }

  /** Random edits of a text, from characters that matter to CSV and to our headers. */
  static String mutate(String text, Random rnd) {
    String alphabet = ",\"\n\r#0123456789.-+eE_ kPamin\tNaN";
    StringBuilder s = new StringBuilder(text);
    int edits = 1 + rnd.nextInt(4);
    for (int i = 0; i < edits; i++) {
      int at = s.length() == 0 ? 0 : rnd.nextInt(s.length());
      char c = alphabet.charAt(rnd.nextInt(alphabet.length()));
      switch (rnd.nextInt(3)) {
        case 0 -> s.insert(at, c);
        case 1 -> {
          if (s.length() > 0) {
            s.deleteCharAt(at);
          }
        }
        default -> {
          if (s.length() > 0) {
            s.setCharAt(at, c);
          }
        }
      }
    }
    return s.toString();
  }

  static List<String> asList(CsvTables tables) {
    List<String> list = new ArrayList<>();
    list.add(tables.properties());
    list.add(tables.increments());
    list.add(tables.readings());
    return list;
  }
}
