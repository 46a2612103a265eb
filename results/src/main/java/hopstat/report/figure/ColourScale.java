package hopstat.report.figure;

import java.awt.Color;
import java.awt.Paint;
import java.io.Serializable;
import org.jfree.chart.renderer.PaintScale;

/**
 * Perceptually ordered colour ramp for heat maps: piecewise-linear through five anchors of the
 * viridis map (van der Walt and Smith, matplotlib, 2015; anchors from memory, approximate). NaN and
 * values outside [lower, upper] are clamped; NaN is light grey.
 */
final class ColourScale implements PaintScale, Serializable {

  private static final long serialVersionUID = 1L;
  private static final int[][] ANCHORS = {
    {68, 1, 84}, {59, 82, 139}, {33, 145, 140}, {94, 201, 98}, {253, 231, 37}
  };

  private final double lower;
  private final double upper;

  ColourScale(double lower, double upper) {
    this.lower = lower;
    this.upper = upper > lower ? upper : lower + 1;
  }

  @Override
  public double getLowerBound() {
    return lower;
  }

  @Override
  public double getUpperBound() {
    return upper;
  }

  @Override
  public Paint getPaint(double value) {
    if (Double.isNaN(value)) {
      return new Color(220, 220, 220);
    }
    double f = Math.max(0, Math.min(1, (value - lower) / (upper - lower))) * (ANCHORS.length - 1);
    int i = Math.min((int) Math.floor(f), ANCHORS.length - 2);
    double w = f - i;
    int[] a = ANCHORS[i];
    int[] b = ANCHORS[i + 1];
    return new Color(
        (int) Math.round(a[0] + w * (b[0] - a[0])),
        (int) Math.round(a[1] + w * (b[1] - a[1])),
        (int) Math.round(a[2] + w * (b[2] - a[2])));
  }
}
