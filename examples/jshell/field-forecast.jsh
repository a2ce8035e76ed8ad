// A field time-settlement forecast by Terzaghi's theory for an INVENTED clay layer: 2 m thick,
// sand above and below (double drainage, H_dr = 1 m), c_v = 0.32 m^2/yr, 250 mm of ultimate
// primary consolidation settlement (the numbers of a handbook example, rounded: t50 = 0.61 yr,
// t90 = 2.65 yr). Open it as README.md in this folder says. Forecasts are for review by a
// qualified engineer; local codes and standards govern.
import java.util.*;
import org.oedometry.theory.*;

double year = ClayLayer.SECONDS_PER_JULIAN_YEAR;
var layer = ClayLayer.of(2.0, Drainage.DOUBLE, 0.32 / year, 0.250);
System.out.println(layer);
System.out.printf(Locale.ROOT, "H_dr = %.3f m%n", layer.drainagePath());
System.out.printf(Locale.ROOT, "time to 50 %%: %.4f years%n", layer.timeToDegree(0.5) / year);
System.out.printf(Locale.ROOT, "time to 90 %%: %.4f years%n", layer.timeToDegree(0.9) / year);
System.out.printf(Locale.ROOT, "time to 100 mm: %.4f years%n", layer.timeToSettlement(0.100) / year);
System.out.printf(Locale.ROOT, "%8s %10s %10s %16s%n", "years", "T", "U (%)", "settlement (mm)");
for (double years : new double[] {0.1, 0.25, 0.5, 1, 2, 3, 5, 10}) {
  double t = years * year;
  System.out.printf(Locale.ROOT, "%8.2f %10.5f %10.4f %16.3f%n",
      years, layer.timeFactorAt(t), 100 * layer.degreeAt(t), 1000 * layer.settlementAt(t));
}
/exit
