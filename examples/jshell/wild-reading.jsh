// A wild reading in an invented increment: a data logger reads a pure Terzaghi curve every 60 s
// for 24 h (1 micrometre of seeded Gaussian noise), and one reading is then knocked 15
// micrometres high, as a bumped dial or a misread value would be. The full-curve fit names the
// reading in an OUTLYING_READING warning (externally studentized residual beyond the 1 %
// Bonferroni bound); the clean curve has no such warning. Invented data: no real soil or site.
// Open it as README.md in this folder says.
import java.util.*;
import org.oedometry.core.*;
import org.oedometry.fitting.*;
import org.oedometry.fitting.synthetic.*;

double year = 365.25 * 86_400;
double trueCv = 2.0 / year;          // 2 m^2/yr
double drainagePath = 0.009;         // 9 mm
var model = new SyntheticIncrement(0.0, 20e-6, 500e-6, trueCv, drainagePath,
    SyntheticIncrement.CreepShape.NONE, 0.0, 1.0);
double[] times = ReadingSchedules.uniform(60, 86_400);
var readings = SyntheticReadings.sample(model, times, 1e-6, 0.0, 7);
SettlementCurve clean = readings.toCurve();
int knocked = 200;                   // the reading at 201 min
double[] t = clean.elapsedSeconds();
double[] d = clean.settlementMetres();
d[knocked] += 15e-6;
SettlementCurve wild = SettlementCurve.of(t, d);

void show(String name, SettlementCurve curve) {
  FullCurveResult fit = FullCurveMethod.fit(curve, drainagePath);
  System.out.printf(Locale.ROOT, "%s: c_v %.3f m^2/yr%n", name, fit.cv() * year);
  for (FitWarning w : fit.warnings()) {
    System.out.println("  " + w.kind() + ": " + w.message());
  }
}

System.out.printf(Locale.ROOT, "knocked reading: index %d (t = %.0f s), +15 um%n", knocked, t[knocked]);
show("clean curve", clean);
show("with the wild reading", wild);
/exit
