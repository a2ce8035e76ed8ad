// A small study of our own: how reading noise biases each c_v method. Invented curves, a pure
// Terzaghi increment after an immediate settlement, read at the usual 14 times (0.1 min to 24 h)
// with a zero reading; Gaussian noise of 0, 0.5, 1 and 2 micrometres, seeds 1..SEEDS, no rounding.
// Printed: each method's median c_v bias (%) against the true c_v, and how many fits failed.
// Open it as README.md in this folder says.
import java.util.*;
import java.util.function.*;
import org.oedometry.core.*;
import org.oedometry.fitting.*;
import org.oedometry.fitting.synthetic.*;

double year = 365.25 * 86_400;
double trueCv = 2.0 / year;          // 2 m^2/yr
double drainagePath = 0.009;         // 9 mm: half of an 18 mm specimen, double drainage
int SEEDS = 15;
double[] noiseMicrometres = {0, 0.5, 1, 2};
var model = new SyntheticIncrement(0.0, 20e-6, 500e-6, trueCv, drainagePath,
    SyntheticIncrement.CreepShape.NONE, 0.0, 1.0);
double[] times = ReadingSchedules.withZeroReading(ReadingSchedules.usualLab());

Map<String, BiFunction<SettlementCurve, Double, CvEstimate>> methods = new LinkedHashMap<>();
methods.put(CvMethod.LOG_TIME.label(), LogTimeMethod::fit);
methods.put(CvMethod.ROOT_TIME.label(), RootTimeMethod::fit);
methods.put(CvMethod.FULL_CURVE.label(), FullCurveMethod::fit);
methods.put(CvMethod.INFLECTION_POINT.label(), InflectionPointMethod::fit);
methods.put(CvMethod.EARLY_SLOPE.label(), EarlySlopeMethod::fit);

double median(List<Double> values) {
  List<Double> sorted = new ArrayList<>(values);
  Collections.sort(sorted);
  int n = sorted.size();
  return n % 2 == 1 ? sorted.get(n / 2) : 0.5 * (sorted.get(n / 2 - 1) + sorted.get(n / 2));
}

System.out.printf(Locale.ROOT, "true c_v = %.2f m^2/yr, H_dr = %.1f mm, primary %.0f um, %d seeds per noise level%n",
    trueCv * year, 1000 * drainagePath, 1e6 * model.primarySettlement(), SEEDS);
System.out.printf(Locale.ROOT, "%-28s %10s %18s %8s%n", "method", "noise (um)", "median bias (%)", "failed");
for (var method : methods.entrySet()) {
  for (double noise : noiseMicrometres) {
    List<Double> bias = new ArrayList<>();
    int failed = 0;
    for (long seed = 1; seed <= SEEDS; seed++) {
      var readings = SyntheticReadings.sample(model, times, noise * 1e-6, 0.0, seed);
      try {
        double cv = method.getValue().apply(readings.toCurve(), drainagePath).cv();
        bias.add(100 * (cv / trueCv - 1));
      } catch (FitException | IllegalArgumentException e) {
        failed++;
      }
    }
    String median = bias.isEmpty() ? "-" : String.format(Locale.ROOT, "%+.2f", median(bias));
    System.out.printf(Locale.ROOT, "%-28s %10.1f %18s %8d%n", method.getKey(), noise, median, failed);
  }
}
/exit
