package org.oedometry.examples.plots;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Path;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.XYSeriesCollection;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.FullCurveMethod;
import org.oedometry.fitting.FullCurveResult;

class FullCurveChartTest {

  private static final FullCurveResult RESULT =
      FullCurveMethod.fit(DemoIncrement.CURVE, DemoIncrement.DRAINAGE_PATH);

  @Test
  @DisplayName("Writes a 900 x 600 PNG with the fit and its residuals")
  void writesPng(@TempDir Path folder) throws IOException {
    Png.check(FullCurveChart.write(DemoIncrement.CURVE, RESULT, "demo", folder.resolve("f.png")));
  }

  @Test
  @DisplayName("Two panels; each residual plus the fitted value gives back its reading")
  void panels() {
    CombinedDomainXYPlot plot =
        (CombinedDomainXYPlot) FullCurveChart.chart(DemoIncrement.CURVE, RESULT, "demo").getPlot();
    assertThat(plot.getSubplots()).hasSize(2);
    XYPlot upper = plot.getSubplots().get(0);
    XYPlot lower = plot.getSubplots().get(1);
    assertThat(upper.getRangeAxis().isInverted()).isTrue();
    assertThat(lower.getRangeAxis().getLabel()).contains("µm");
    XYSeriesCollection residuals = (XYSeriesCollection) lower.getDataset();
    SettlementCurve curve = DemoIncrement.CURVE;
    // Independent check: the forward model (theory) at the reading's time plus the residual.
    var model = org.oedometry.theory.ConsolidationCurveModel.of(DemoIncrement.DRAINAGE_PATH);
    for (int i : new int[] {0, 5, residuals.getSeries(0).getItemCount() - 1}) {
      double t = curve.elapsedSeconds(i + 1);
      double fitted = model.settlement(t, RESULT.parameters());
      double residualMetres = residuals.getSeries(0).getY(i).doubleValue() / 1e6;
      assertThat(fitted + residualMetres).isCloseTo(curve.settlementMetres(i + 1), within(1e-9));
    }
  }

  @Test
  @DisplayName("Residuals that do not match the readings are refused")
  void refusesMismatch() {
    SettlementCurve shorter =
        SettlementCurve.of(new double[] {0, 1, 2, 3, 4, 5, 6, 7}, new double[8]);
    assertThatThrownBy(() -> FullCurveChart.chart(shorter, RESULT, "t"))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("residuals");
  }
}
