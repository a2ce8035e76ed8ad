// Every per-increment c_v method of oedometry on one curve of the INVENTED demo test
// (increment 6, 200 -> 400 kPa, read by a data logger every 10 s). Open it as README.md in this
// folder says. Results are for review by a qualified engineer; local codes and standards govern.
import java.util.*;
import java.util.function.*;
import org.oedometry.core.*;
import org.oedometry.fitting.*;
import org.oedometry.examples.demo.DemoTestGenerator;

var test = DemoTestGenerator.generate();
int index = 5;
var increment = test.increments().get(index);
var curve = increment.curve();
double year = 365.25 * 86_400;

// Drainage path by the test's rule (half the height at 50 % consolidation, double drainage):
// a first log-time fit with the start height gives d50, the height there gives H_dr.
double startHeight = test.heightAtStartMetres(index);
double firstD50 = LogTimeMethod.fit(curve, startHeight / 2).d50();
double drainagePath = (startHeight - firstD50) / 2;

System.out.printf(Locale.ROOT, "INVENTED demo test, increment %d: %.0f -> %.0f kPa, %d readings%n",
    index + 1, increment.stressBeforePascals() / 1000, increment.stressAfterPascals() / 1000, curve.size());
System.out.printf(Locale.ROOT, "H_dr = %.5f mm (half the height at d50 of a first log-time fit)%n", 1000 * drainagePath);

String warningKinds(List<FitWarning> warnings) {
  if (warnings.isEmpty()) return "-";
  return warnings.stream().map(w -> w.kind().name().toLowerCase(Locale.ROOT).replace('_', ' '))
      .collect(java.util.stream.Collectors.joining(", "));
}

void row(String label, Supplier<CvEstimate> fit, ToDoubleFunction<CvEstimate> keyTime, String keyName) {
  try {
    CvEstimate e = fit.get();
    System.out.printf(Locale.ROOT, "%-36s %12.4f   %s = %10.2f s   %s%n", label, e.cv() * year, keyName,
        keyTime.applyAsDouble(e), warningKinds(e.warnings()));
  } catch (FitException | IllegalArgumentException failure) {
    System.out.printf(Locale.ROOT, "%-36s failed: %s%n", label, failure.getMessage());
  }
}

System.out.printf(Locale.ROOT, "%-36s %12s   %-18s   %s%n", "method", "c_v (m^2/yr)", "key time", "warnings");
row(CvMethod.LOG_TIME.label(), () -> LogTimeMethod.fit(curve, drainagePath), e -> ((LogTimeResult) e).t50(), "t50");
row(CvMethod.ROOT_TIME.label(), () -> RootTimeMethod.fit(curve, drainagePath), e -> ((RootTimeResult) e).t90(), "t90");
row(CvMethod.FULL_CURVE.label(), () -> FullCurveMethod.fit(curve, drainagePath),
    e -> org.oedometry.theory.Terzaghi.timeFactor(0.5) * drainagePath * drainagePath / e.cv(), "t50");
row(CvMethod.INFLECTION_POINT.label(), () -> InflectionPointMethod.fit(curve, drainagePath),
    e -> ((InflectionPointResult) e).inflectionTime(), "t_I");
row(CvMethod.RECTANGULAR_HYPERBOLA.label(), () -> RectangularHyperbolaMethod.fit(curve, drainagePath),
    e -> ((RectangularHyperbolaResult) e).t90(), "t90");
row(CvMethod.EARLY_SLOPE.label(), () -> EarlySlopeMethod.fit(curve, drainagePath), e -> ((EarlySlopeResult) e).t50(), "t50");
row(CvMethod.ASAOKA.label(), () -> AsaokaMethod.fit(curve, drainagePath), e -> ((AsaokaResult) e).t50(), "t50");
System.out.printf(Locale.ROOT, "true c_v of the generator (invented): %.4f m^2/yr%n",
    DemoTestGenerator.truth().get(index).parameters().cv() * year);
/exit
