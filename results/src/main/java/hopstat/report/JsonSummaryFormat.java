package hopstat.report;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import hopstat.statistics.BootstrapOps;
import hopstat.statistics.BoundaryEstimate;
import hopstat.statistics.IntegerDistribution;
import hopstat.statistics.Interval;
import hopstat.statistics.MeanEstimate;
import hopstat.statistics.MobilityAgreement;
import hopstat.statistics.MobilityCurve;
import hopstat.statistics.MobilityEdge;
import hopstat.statistics.MobilityGap;
import hopstat.statistics.MobilityMethod;
import hopstat.statistics.MobilityOps;
import hopstat.statistics.MobilitySummary;
import hopstat.statistics.PointSummary;
import hopstat.statistics.Quantiles;
import hopstat.statistics.QuantitySummary;
import hopstat.statistics.SampleStatisticsOps;
import hopstat.statistics.Summary;
import hopstat.statistics.TypicalValue;
import hopstat.statistics.ValueProbability;
import java.io.IOException;
import java.io.Writer;
import java.util.Map;

/**
 * {@code summary.json}: the numbers of {@code summary.csv} plus, for integer-valued invariants, the
 * distribution of rounded values per point (value → count and fraction), the Wilson interval of the
 * modal fraction and the largest distance of any sample from its nearest integer. States the
 * estimator, error measure and confidence level. Later additions (appended after the original
 * fields): quantiles, bootstrap interval of the mean, typical value, P(value) with Wilson intervals
 * per integer value, the phase-boundary estimates with their bootstrap intervals, and the {@code
 * mobility} section (mobility edges and gaps by three estimators, see {@link MobilityOps}; always
 * present, with empty lists when the study measured nothing they use). Contains nothing that
 * depends on when, where or with how many threads the run happened, so equal journals give
 * byte-identical files.
 */
final class JsonSummaryFormat implements ReportFormat {

  /** Layout version of summary.json. */
  static final int FORMAT_VERSION = 1;

  @Override
  public String fileName() {
    return "summary.json";
  }

  @Override
  public void write(Summary s, Writer out) throws IOException {
    JsonGenerator g = new JsonFactory().createGenerator(out);
    g.useDefaultPrettyPrinter();
    g.writeStartObject();
    g.writeNumberField("format", FORMAT_VERSION);
    g.writeStringField("name", s.name());
    g.writeStringField("specHash", s.specHash());
    g.writeObjectFieldStart("statistics");
    g.writeStringField("estimator", MeanEstimate.ESTIMATOR);
    g.writeStringField("errorMeasure", MeanEstimate.ERROR_MEASURE);
    g.writeStringField("interval", MeanEstimate.INTERVAL);
    g.writeNumberField("confidenceLevel", SampleStatisticsOps.CONFIDENCE);
    g.writeStringField("modalFractionInterval", "Wilson score");
    g.writeNumberField("quantisationTolerance", SampleStatisticsOps.QUANTISATION_TOLERANCE);
    g.writeStringField(
        "excludes",
        "finite-size and other systematic errors; only disorder-sampling error is included");
    g.writeStringField("quantiles", Quantiles.METHOD);
    g.writeStringField("bootstrap", BootstrapOps.METHOD);
    g.writeNumberField("bootstrapResamples", BootstrapOps.RESAMPLES);
    g.writeStringField("bootstrapSeed", BootstrapOps.SEED_RULE);
    g.writeStringField("typical", TypicalValue.METHOD);
    g.writeEndObject();
    g.writeArrayFieldStart("grid");
    for (String name : s.gridNames()) {
      g.writeString(name);
    }
    g.writeEndArray();
    g.writeNumberField("plannedPerPoint", s.plannedPerPoint());
    g.writeNumberField("done", s.done());
    g.writeNumberField("failed", s.failed());
    g.writeArrayFieldStart("points");
    for (PointSummary p : s.points()) {
      g.writeStartObject();
      g.writeNumberField("index", p.index());
      g.writeObjectFieldStart("coordinates");
      for (Map.Entry<String, Double> e : p.coordinates().entrySet()) {
        g.writeNumberField(e.getKey(), e.getValue());
      }
      g.writeEndObject();
      g.writeNumberField("done", p.done());
      g.writeNumberField("failed", p.failed());
      if (!p.failureReasons().isEmpty()) {
        g.writeObjectFieldStart("failureReasons");
        for (Map.Entry<String, Integer> e : p.failureReasons().entrySet()) {
          g.writeNumberField(e.getKey(), e.getValue());
        }
        g.writeEndObject();
      }
      g.writeObjectFieldStart("quantities");
      for (QuantitySummary q : p.quantities()) {
        writeQuantity(g, q);
      }
      g.writeEndObject();
      g.writeEndObject();
    }
    g.writeEndArray();
    g.writeArrayFieldStart("boundaries");
    for (BoundaryEstimate b : s.boundaries()) {
      writeBoundary(g, b);
    }
    g.writeEndArray();
    writeMobility(g, s.mobility());
    g.writeEndObject();
    g.flush();
    out.write('\n');
  }

  private static void writeQuantity(JsonGenerator g, QuantitySummary q) throws IOException {
    MeanEstimate m = q.mean();
    g.writeObjectFieldStart(q.name());
    g.writeNumberField("n", m.n());
    number(g, "mean", m.mean());
    number(g, "stderr", m.standardError());
    number(g, "ci95Low", m.ciLow());
    number(g, "ci95High", m.ciHigh());
    number(g, "std", m.standardDeviation());
    number(g, "median", q.median());
    number(g, "min", q.min());
    number(g, "max", q.max());
    IntegerDistribution d = q.integer();
    if (d != null) {
      g.writeObjectFieldStart("integer");
      g.writeNumberField("modal", d.modalValue());
      number(g, "modalFraction", d.modalFraction());
      number(g, "modalFractionWilsonLow", d.modalWilsonLow());
      number(g, "modalFractionWilsonHigh", d.modalWilsonHigh());
      number(g, "maxDistanceToInteger", d.maxDistanceToInteger());
      g.writeNumberField("nonQuantised", d.nonQuantised());
      g.writeObjectFieldStart("distribution");
      for (Map.Entry<Long, Integer> e : d.counts().entrySet()) {
        g.writeObjectFieldStart(Long.toString(e.getKey()));
        g.writeNumberField("count", e.getValue());
        number(g, "fraction", (double) e.getValue() / d.n());
        ValueProbability vp =
            d.probabilities().stream()
                .filter(v -> v.value() == e.getKey())
                .findFirst()
                .orElseThrow();
        number(g, "wilsonLow", vp.wilsonLow());
        number(g, "wilsonHigh", vp.wilsonHigh());
        g.writeEndObject();
      }
      g.writeEndObject();
      g.writeEndObject();
    }
    Quantiles qs = q.quantiles();
    g.writeObjectFieldStart("quantiles");
    number(g, "q05", qs.q05());
    number(g, "q25", qs.q25());
    number(g, "q75", qs.q75());
    number(g, "q95", qs.q95());
    g.writeEndObject();
    number(g, "boot95Low", q.meanBootstrap().low());
    number(g, "boot95High", q.meanBootstrap().high());
    TypicalValue tv = q.typical();
    if (tv != null) {
      g.writeObjectFieldStart("typical");
      g.writeNumberField("n", tv.n());
      number(g, "geometricMean", tv.geometricMean());
      number(g, "logStderr", tv.logStandardError());
      number(g, "ci95Low", tv.ciLow());
      number(g, "ci95High", tv.ciHigh());
      g.writeEndObject();
    }
    g.writeEndObject();
  }

  private static void writeBoundary(JsonGenerator g, BoundaryEstimate b) throws IOException {
    g.writeStartObject();
    g.writeStringField("kind", b.kind().name());
    g.writeStringField("quantity", b.quantity());
    g.writeStringField("axis", b.axis());
    g.writeObjectFieldStart("fixed");
    for (Map.Entry<String, Double> e : b.fixed().entrySet()) {
      g.writeNumberField(e.getKey(), e.getValue());
    }
    g.writeEndObject();
    number(g, "level", b.level());
    number(g, "sizeLow", b.sizeLow());
    number(g, "sizeHigh", b.sizeHigh());
    number(g, "estimate", b.estimate());
    number(g, "ci95Low", b.interval().low());
    number(g, "ci95High", b.interval().high());
    number(g, "existsFraction", b.existsFraction());
    g.writeNumberField("resamples", b.resamples());
    g.writeNumberField("nearestPoint", b.nearestPoint());
    g.writeEndObject();
  }

  private static void writeMobility(JsonGenerator g, MobilitySummary m) throws IOException {
    g.writeObjectFieldStart("mobility");
    g.writeObjectFieldStart("conventions");
    g.writeStringField(
        "effectiveClass", m.effectiveClass() == null ? "" : m.effectiveClass().name());
    g.writeStringField("wignerDysonEnsemble", m.wignerDysonEnsemble());
    number(g, "wignerDysonRatio", m.wignerDysonRatio());
    number(g, "poissonRatio", MobilityOps.POISSON_RATIO);
    number(g, "quantisedFraction", MobilityOps.QUANTISED_FRACTION);
    number(g, "quantisationTolerance", SampleStatisticsOps.QUANTISATION_TOLERANCE);
    number(g, "minWindowPresence", MobilityOps.MIN_WINDOW_PRESENCE);
    g.writeStringField(
        "reference",
        "fixed fermiEnergy when common to the curve and inside the scan, else the centre of the scan");
    g.writeStringField(
        "halfWidth",
        "(upper - lower)/2 of the window around the reference classed localised (quantised); 0 when the reference is not inside one");
    g.writeStringField("agreement", "all pairs of 95 % intervals of the half-width overlap");
    g.writeStringField(
        "excludes",
        "finite-size drift of crossings and the resolution of the energy grid; only disorder-sampling error is included");
    g.writeEndObject();
    g.writeArrayFieldStart("gaps");
    for (MobilityGap x : m.gaps()) {
      g.writeStartObject();
      g.writeStringField("method", x.method().name());
      g.writeStringField("quantity", x.quantity());
      g.writeStringField("axis", x.axis());
      fixed(g, x.fixed());
      g.writeStringField("criterion", x.criterion());
      number(g, "sizeLow", x.sizeLow());
      number(g, "sizeHigh", x.sizeHigh());
      number(g, "reference", x.reference());
      number(g, "lower", x.lower());
      number(g, "upper", x.upper());
      g.writeBooleanField("lowerOpen", x.lowerOpen());
      g.writeBooleanField("upperOpen", x.upperOpen());
      number(g, "halfWidth", x.halfWidth());
      interval(g, "halfWidthCi95", x.interval());
      interval(g, "lowerCi95", x.lowerInterval());
      interval(g, "upperCi95", x.upperInterval());
      number(g, "insideFraction", x.insideFraction());
      g.writeNumberField("resamples", x.resamples());
      g.writeEndObject();
    }
    g.writeEndArray();
    g.writeArrayFieldStart("agreements");
    for (MobilityAgreement a : m.agreements()) {
      g.writeStartObject();
      fixed(g, a.fixed());
      g.writeArrayFieldStart("estimates");
      for (String e : a.estimates()) {
        g.writeString(e);
      }
      g.writeEndArray();
      g.writeStringField("verdict", a.verdict());
      g.writeEndObject();
    }
    g.writeEndArray();
    g.writeArrayFieldStart("edges");
    for (MobilityEdge e : m.edges()) {
      g.writeStartObject();
      g.writeStringField("method", e.method().name());
      g.writeStringField("quantity", e.quantity());
      g.writeStringField("axis", e.axis());
      fixed(g, e.fixed());
      g.writeStringField("criterion", e.criterion());
      number(g, "sizeLow", e.sizeLow());
      number(g, "sizeHigh", e.sizeHigh());
      number(g, "level", e.level());
      number(g, "estimate", e.estimate());
      interval(g, "ci95", e.interval());
      number(g, "existsFraction", e.existsFraction());
      g.writeNumberField("resamples", e.resamples());
      g.writeEndObject();
    }
    g.writeEndArray();
    g.writeArrayFieldStart("curves");
    for (MobilityCurve c : m.curves()) {
      g.writeStartObject();
      g.writeStringField("method", c.method().name());
      g.writeStringField("quantity", c.quantity());
      g.writeStringField("axis", c.axis());
      fixed(g, c.fixed());
      number(g, "size", c.size());
      if (c.method() == MobilityMethod.INVARIANT_PLATEAU) {
        number(g, "plateauValue", c.plateauValue());
      }
      g.writeArrayFieldStart("points");
      for (MobilityCurve.Point p : c.points()) {
        g.writeStartObject();
        number(g, "position", p.position());
        g.writeNumberField("n", p.n());
        number(g, "mean", p.mean());
        interval(g, "ci95", p.interval());
        g.writeStringField("interval", p.interval().method());
        g.writeStringField("state", p.state());
        g.writeEndObject();
      }
      g.writeEndArray();
      g.writeEndObject();
    }
    g.writeEndArray();
    g.writeEndObject();
  }

  private static void fixed(JsonGenerator g, Map<String, Double> fixed) throws IOException {
    g.writeObjectFieldStart("fixed");
    for (Map.Entry<String, Double> e : fixed.entrySet()) {
      number(g, e.getKey(), e.getValue());
    }
    g.writeEndObject();
  }

  private static void interval(JsonGenerator g, String field, Interval i) throws IOException {
    g.writeArrayFieldStart(field);
    for (double x : new double[] {i.low(), i.high()}) {
      if (Double.isFinite(x)) {
        g.writeNumber(x);
      } else {
        g.writeNull();
      }
    }
    g.writeEndArray();
  }

  /** JSON has no NaN: undefined numbers are written as null. */
  private static void number(JsonGenerator g, String field, double x) throws IOException {
    if (Double.isFinite(x)) {
      g.writeNumberField(field, x);
    } else {
      g.writeNullField(field);
    }
  }
}
