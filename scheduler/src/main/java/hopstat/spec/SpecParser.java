package hopstat.spec;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import hopstat.disorder.DisorderCatalog;
import hopstat.disorder.DisorderKind;
import hopstat.lattice.Boundary;
import hopstat.model.CustomModel;
import hopstat.model.CustomModelDefinition;
import hopstat.model.Model;
import hopstat.model.ModelCatalog;
import hopstat.model.ParameterInfo;
import hopstat.model.Symmetry;
import hopstat.model.SymmetryClass;
import hopstat.task.InvalidInputException;
import hopstat.task.Observable;
import hopstat.task.ObservableCatalog;
import hopstat.task.Quantity;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Pattern;

/**
 * Parses and validates a job spec (JSON). Every problem is collected with its field path and all
 * are thrown at once as one {@link InvalidInputException}.
 */
public final class SpecParser {

  /** Linear size parameter. */
  public static final String SIZE = "L";

  /** Fermi energy parameter (default 0). */
  public static final String FERMI_ENERGY = "fermiEnergy";

  /** Model name that picks anderson-1d/2d/3d by the parameter {@code dim}. */
  public static final String ANDERSON = "anderson";

  /** Largest accepted linear size; larger samples need the linear-scaling methods. */
  public static final int MAX_LINEAR_SIZE = 4096;

  /** Largest number of realisations per point. */
  public static final int MAX_REALISATIONS = 10_000_000;

  /** Largest number of points in a range. */
  public static final int MAX_RANGE_STEPS = 100_000;

  private static final Set<String> TOP_LEVEL =
      Set.of(
          "name",
          "description",
          "seed",
          "model",
          "parameters",
          "disorder",
          "boundary",
          "observables",
          "realisations",
          "sampling",
          "lattice");
  private static final Pattern NAME = Pattern.compile("[A-Za-z0-9][A-Za-z0-9._-]{0,79}");
  private static final ObjectMapper STRICT =
      new ObjectMapper()
          .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION)
          .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
          .enable(DeserializationFeature.USE_BIG_DECIMAL_FOR_FLOATS);
  private static final ObjectMapper CANONICAL =
      new ObjectMapper().enable(SerializationFeature.ORDER_MAP_ENTRIES_BY_KEYS);

  private SpecParser() {}

  /**
   * Parses spec text.
   *
   * @throws InvalidInputException listing every problem found
   */
  public static JobSpec parse(String text) {
    JsonNode root;
    try {
      root = STRICT.readTree(text);
    } catch (JsonProcessingException e) {
      String where =
          e.getLocation() == null
              ? ""
              : " at line "
                  + e.getLocation().getLineNr()
                  + ", column "
                  + e.getLocation().getColumnNr();
      throw new InvalidInputException(
          "", null, "not valid JSON" + where + ": " + e.getOriginalMessage());
    }
    if (root == null || !root.isObject()) {
      throw new InvalidInputException(
          "",
          root == null ? "empty" : root.getNodeType().toString().toLowerCase(Locale.ROOT),
          "a job spec is a JSON object");
    }
    return new SpecParser.Run(root).parse();
  }

  /** SHA-256 of the canonical form of a JSON tree (keys sorted, no whitespace), in hex. */
  public static String canonicalHash(JsonNode root) {
    try {
      Object plain = CANONICAL.treeToValue(root, Object.class);
      byte[] canonical = CANONICAL.writeValueAsBytes(plain);
      return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(canonical));
    } catch (JsonProcessingException | NoSuchAlgorithmException e) {
      throw new IllegalStateException("cannot hash spec", e);
    }
  }

  /** One validation pass; holds the collector. */
  private static final class Run {
    private final JsonNode root;
    private final InvalidInputException.Collector problems = new InvalidInputException.Collector();

    Run(JsonNode root) {
      this.root = root;
    }

    JobSpec parse() {
      for (Iterator<String> it = root.fieldNames(); it.hasNext(); ) {
        String key = it.next();
        if (!TOP_LEVEL.contains(key)) {
          problems.add(
              key, null, "unknown key; allowed: " + String.join(", ", new TreeSet<>(TOP_LEVEL)));
        }
      }
      String name = requiredText("name");
      if (name != null && !NAME.matcher(name).matches()) {
        problems.add(
            "name",
            name,
            "1-80 characters from letters, digits, '.', '_', '-', starting with a letter or digit");
      }
      String description = root.has("description") ? optionalText("description") : "";
      Long seed = requiredLong("seed");
      String modelName = requiredText("model");
      if (ANDERSON.equals(modelName)) {
        modelName = andersonByDimension();
      }
      Model model = null;
      boolean custom = CustomModel.NAME.equals(modelName);
      if (modelName != null && !custom) {
        model = ModelCatalog.find(modelName).orElse(null);
        if (model == null) {
          List<String> known =
              new ArrayList<>(ModelCatalog.all().stream().map(Model::name).toList());
          known.add(CustomModel.NAME);
          problems.add("model", modelName, "unknown model; known: " + String.join(", ", known));
        }
      }
      if (root.has("lattice") && !custom) {
        problems.add("lattice", null, "read only with \"model\": \"custom\"");
      }
      Boundary boundary = parseBoundary();
      List<Observable> observables = parseObservables();
      List<ParameterSpec> parameters = parseParameters();
      CustomModelDefinition customModel = null;
      if (custom) {
        if (!root.has("lattice")) {
          problems.add(
              "lattice", null, "required by model custom: the unit cell, its terms and its class");
        } else {
          Set<String> defined = new LinkedHashSet<>();
          parameters.forEach(p -> defined.add(p.name()));
          customModel = CustomModelParser.parse(root.get("lattice"), defined, problems);
          model = customModel == null ? null : new CustomModel(customModel);
        }
      }
      List<DisorderSpec> disorder = parseDisorder(parameters, model);
      Integer realisations = null;
      SamplingSpec sampling = null;
      if (root.has("sampling")) {
        sampling = parseSampling(observables);
        if (root.has("realisations")) {
          problems.add(
              "realisations",
              root.get("realisations").toString(),
              "omit it when \"sampling\" is given (sampling.maximum sets the largest count)");
        }
        realisations = sampling == null ? null : sampling.maximum();
      } else {
        realisations = requiredInt("realisations", 1, MAX_REALISATIONS);
      }

      SymmetryClass effective = null;
      if (model != null) {
        effective = effectiveClass(model, disorder);
        parameters = checkParameters(model, observables, disorder, parameters);
        checkObservables(
            model,
            boundary,
            effective,
            observables,
            disorder.stream().map(DisorderSpec::type).toList());
        checkObservablesWithDisorder(observables, disorder, parameters);
      }
      problems.throwIfAny();
      return new JobSpec(
          name,
          description,
          seed,
          modelName,
          parameters,
          disorder,
          boundary,
          observables.stream().map(Observable::name).toList(),
          realisations,
          sampling,
          effective,
          canonicalHash(root),
          customModel);
    }

    /**
     * {@code "model": "anderson"} with the parameter {@code dim} (1, 2 or 3, one value) stands for
     * the model {@code anderson-<dim>d}; {@code dim} stays a recorded parameter of the point.
     */
    private String andersonByDimension() {
      JsonNode dim = root.path("parameters").get("dim");
      if (dim == null) {
        problems.add(
            "parameters.dim", null, "required by model anderson: the dimension, 1, 2 or 3");
        return null;
      }
      if (!dim.isNumber()
          || dim.asDouble() != Math.rint(dim.asDouble())
          || dim.asInt() < 1
          || dim.asInt() > 3) {
        problems.add(
            "parameters.dim",
            dim.toString(),
            "must be one number: 1, 2 or 3 (a grid over dimensions needs separate jobs)");
        return null;
      }
      return ANDERSON + "-" + dim.asInt() + "d";
    }

    private String requiredText(String key) {
      JsonNode n = root.get(key);
      if (n == null || n.isNull()) {
        problems.add(key, null, "required");
        return null;
      }
      if (!n.isTextual()) {
        problems.add(key, n.toString(), "must be a string");
        return null;
      }
      return n.asText();
    }

    private String optionalText(String key) {
      JsonNode n = root.get(key);
      if (!n.isTextual()) {
        problems.add(key, n.toString(), "must be a string");
        return "";
      }
      return n.asText();
    }

    private Long requiredLong(String key) {
      JsonNode n = root.get(key);
      if (n == null || n.isNull()) {
        problems.add(key, null, "required: an integer");
        return null;
      }
      if (!n.isIntegralNumber() || !n.canConvertToLong()) {
        problems.add(key, n.toString(), "must be an integer in the 64-bit range");
        return null;
      }
      return n.asLong();
    }

    private Integer requiredInt(String key, int min, int max) {
      return intAt(root.get(key), key, min, max, true);
    }

    private Integer intAt(JsonNode n, String path, int min, int max, boolean required) {
      if (n == null || n.isNull()) {
        if (required) {
          problems.add(path, null, "required: an integer from " + min + " to " + max);
        }
        return null;
      }
      if (!n.isIntegralNumber() || !n.canConvertToInt() || n.asInt() < min || n.asInt() > max) {
        problems.add(path, n.toString(), "must be an integer from " + min + " to " + max);
        return null;
      }
      return n.asInt();
    }

    private Boundary parseBoundary() {
      JsonNode n = root.get("boundary");
      if (n == null) {
        return Boundary.PERIODIC;
      }
      for (Boundary b : Boundary.values()) {
        if (n.isTextual() && b.specName().equals(n.asText())) {
          return b;
        }
      }
      problems.add("boundary", n.toString(), "must be \"periodic\" or \"open\"");
      return Boundary.PERIODIC;
    }

    private List<Observable> parseObservables() {
      List<Observable> found = new ArrayList<>();
      JsonNode n = root.get("observables");
      if (n == null) {
        problems.add("observables", null, "required: a non-empty list of observable names");
        return found;
      }
      if (!n.isArray() || n.isEmpty()) {
        problems.add("observables", n.toString(), "must be a non-empty list of observable names");
        return found;
      }
      Set<String> seen = new LinkedHashSet<>();
      for (int i = 0; i < n.size(); i++) {
        String path = "observables[" + i + "]";
        JsonNode o = n.get(i);
        if (!o.isTextual()) {
          problems.add(path, o.toString(), "must be a string");
          continue;
        }
        Observable obs = ObservableCatalog.find(o.asText()).orElse(null);
        if (obs == null) {
          problems.add(
              path,
              o.asText(),
              "unknown observable; known: "
                  + String.join(
                      ", ", ObservableCatalog.all().stream().map(Observable::name).toList()));
        } else if (!seen.add(obs.name())) {
          problems.add(path, o.asText(), "listed twice");
        } else {
          found.add(obs);
        }
      }
      return found;
    }

    private List<ParameterSpec> parseParameters() {
      List<ParameterSpec> found = new ArrayList<>();
      JsonNode n = root.get("parameters");
      if (n == null) {
        problems.add(
            "parameters", null, "required: an object of parameter values (at least \"L\")");
        return found;
      }
      if (!n.isObject()) {
        problems.add(
            "parameters",
            n.toString(),
            "must be an object mapping names to a number, a list of numbers or a range");
        return found;
      }
      for (Iterator<Map.Entry<String, JsonNode>> it = n.fields(); it.hasNext(); ) {
        Map.Entry<String, JsonNode> e = it.next();
        ParameterSpec p = parseParameterValue("parameters." + e.getKey(), e.getKey(), e.getValue());
        if (p != null) {
          found.add(p);
        }
      }
      return found;
    }

    private ParameterSpec parseParameterValue(String path, String name, JsonNode v) {
      if (v.isNumber()) {
        Double d = finite(path, v);
        return d == null ? null : new ParameterSpec(name, List.of(d), false);
      }
      if (v.isArray()) {
        if (v.isEmpty()) {
          problems.add(path, "[]", "a list needs at least one number");
          return null;
        }
        List<Double> values = new ArrayList<>();
        boolean ok = true;
        for (int i = 0; i < v.size(); i++) {
          Double d = v.get(i).isNumber() ? finite(path + "[" + i + "]", v.get(i)) : null;
          if (!v.get(i).isNumber()) {
            problems.add(path + "[" + i + "]", v.get(i).toString(), "must be a number");
          }
          ok &= d != null;
          values.add(d);
        }
        return ok ? new ParameterSpec(name, values, true) : null;
      }
      if (v.isObject()) {
        return parseRange(path, name, v);
      }
      problems.add(
          path,
          v.toString(),
          "must be a number, a list of numbers or a range {\"from\": a, \"to\": b, \"steps\": n}");
      return null;
    }

    private ParameterSpec parseRange(String path, String name, JsonNode v) {
      boolean ok = true;
      for (Iterator<String> it = v.fieldNames(); it.hasNext(); ) {
        String k = it.next();
        if (!Set.of("from", "to", "steps").contains(k)) {
          problems.add(path + "." + k, null, "unknown key in a range; allowed: from, to, steps");
          ok = false;
        }
      }
      Double from = null;
      Double to = null;
      for (String k : List.of("from", "to")) {
        JsonNode x = v.get(k);
        if (x == null || !x.isNumber()) {
          problems.add(
              path + "." + k,
              x == null ? null : x.toString(),
              x == null ? "required in a range" : "must be a number");
          ok = false;
        } else if (k.equals("from")) {
          from = finite(path + ".from", x);
        } else {
          to = finite(path + ".to", x);
        }
      }
      Integer steps = intAt(v.get("steps"), path + ".steps", 1, MAX_RANGE_STEPS, true);
      if (!ok || from == null || to == null || steps == null) {
        return null;
      }
      if (steps == 1 && from.doubleValue() != to.doubleValue()) {
        problems.add(path + ".steps", "1", "a one-step range needs from = to; use steps >= 2");
        return null;
      }
      // Decimal arithmetic on the numbers as written, so {"from": 0, "to": 0.3, "steps": 4} gives
      // 0.1 and 0.2 (not 0.09999999999999999); both ends exact.
      java.math.BigDecimal a = v.get("from").decimalValue();
      java.math.BigDecimal b = v.get("to").decimalValue();
      List<Double> values = new ArrayList<>();
      for (int i = 0; i < steps; i++) {
        double x =
            i == 0
                ? from
                : i == steps - 1
                    ? to
                    : a.add(
                            b.subtract(a)
                                .multiply(java.math.BigDecimal.valueOf(i))
                                .divide(
                                    java.math.BigDecimal.valueOf(steps - 1),
                                    java.math.MathContext.DECIMAL64))
                        .doubleValue();
        values.add(x);
      }
      return new ParameterSpec(name, values, true);
    }

    private Double finite(String path, JsonNode x) {
      double d = x.asDouble();
      if (!Double.isFinite(d)) {
        problems.add(path, x.toString(), "must be a finite number");
        return null;
      }
      return d;
    }

    private List<DisorderSpec> parseDisorder(List<ParameterSpec> parameters, Model model) {
      List<DisorderSpec> found = new ArrayList<>();
      List<DisorderKind> kinds = new ArrayList<>();
      List<String> kindPaths = new ArrayList<>();
      JsonNode n = root.get("disorder");
      if (n == null) {
        return found;
      }
      if (!n.isArray()) {
        problems.add(
            "disorder",
            n.toString(),
            "must be a list of {\"type\": ..., \"strength\": ...} objects");
        return found;
      }
      for (int i = 0; i < n.size(); i++) {
        String path = "disorder[" + i + "]";
        JsonNode d = n.get(i);
        if (!d.isObject()) {
          problems.add(path, d.toString(), "must be an object with \"type\" and \"strength\"");
          continue;
        }
        JsonNode type = d.get("type");
        DisorderKind kind = null;
        if (type == null || !type.isTextual()) {
          problems.add(
              path + ".type",
              type == null ? null : type.toString(),
              "required: a disorder type name");
        } else {
          kind = DisorderCatalog.find(type.asText()).orElse(null);
          if (kind == null) {
            problems.add(
                path + ".type",
                type.asText(),
                "unknown disorder type; known: "
                    + String.join(
                        ", ", DisorderCatalog.all().stream().map(DisorderKind::name).toList()));
          }
        }
        double value = Double.NaN;
        String parameter = null;
        JsonNode s = d.get("strength");
        if (s == null) {
          problems.add(
              path + ".strength", null, "required: a number >= 0 or the name of a parameter");
        } else if (s.isNumber()) {
          Double v = finite(path + ".strength", s);
          if (v != null && v < 0) {
            problems.add(path + ".strength", s.toString(), "must be >= 0");
          } else if (v != null) {
            value = v;
            if (kind != null) {
              String text = s.toString();
              kind.whyNotValidStrength(v)
                  .ifPresent(reason -> problems.add(path + ".strength", text, reason));
            }
          }
        } else if (s.isTextual()) {
          parameter = s.asText();
          ParameterSpec p =
              parameters.stream().filter(q -> q.name().equals(s.asText())).findFirst().orElse(null);
          if (p == null) {
            problems.add(
                path + ".strength",
                s.asText(),
                "names no entry of \"parameters\"; define it there or give a number");
            parameter = null;
          } else if (p.values().stream().anyMatch(x -> x < 0)) {
            problems.add(
                "parameters." + p.name(),
                p.values().toString(),
                "used as a disorder strength, so every value must be >= 0");
          } else if (kind != null) {
            DisorderKind k = kind;
            p.values().stream()
                .map(k::whyNotValidStrength)
                .flatMap(Optional::stream)
                .findFirst()
                .ifPresent(
                    reason ->
                        problems.add(
                            "parameters." + p.name(),
                            p.values().toString(),
                            "used as the strength of " + path + ": " + reason));
          }
        } else {
          problems.add(
              path + ".strength", s.toString(), "must be a number >= 0 or the name of a parameter");
        }
        Map<String, String> options = new LinkedHashMap<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = d.fields(); it.hasNext(); ) {
          Map.Entry<String, JsonNode> e = it.next();
          if (e.getKey().equals("type") || e.getKey().equals("strength") || kind == null) {
            continue;
          }
          Set<String> allowed = kind.options().get(e.getKey());
          String optPath = path + "." + e.getKey();
          if (allowed == null) {
            problems.add(
                optPath,
                null,
                "unknown option of "
                    + kind.name()
                    + "; allowed: "
                    + (kind.options().isEmpty()
                        ? "none"
                        : String.join(", ", new TreeSet<>(kind.options().keySet()))));
          } else if (!e.getValue().isTextual()
              || (!allowed.isEmpty() && !allowed.contains(e.getValue().asText()))) {
            problems.add(
                optPath,
                e.getValue().toString(),
                "allowed values: " + String.join(", ", new TreeSet<>(allowed)));
          } else {
            options.put(e.getKey(), e.getValue().asText());
          }
        }
        if (kind != null && model != null) {
          DisorderKind k = kind;
          k.whyNotApplicable(model)
              .ifPresent(reason -> problems.add(path + ".type", k.name(), reason));
        }
        if (kind != null && (parameter != null || !Double.isNaN(value))) {
          found.add(new DisorderSpec(kind.name(), value, parameter, options));
        }
        if (kind != null) {
          kinds.add(kind);
          kindPaths.add(path);
        }
      }
      for (int i = 0; i < kinds.size(); i++) {
        for (int j = i + 1; j < kinds.size(); j++) {
          Optional<String> reason = kinds.get(i).whyNotBefore(kinds.get(j));
          if (reason.isPresent()) {
            problems.add(kindPaths.get(i) + ".type", kinds.get(i).name(), reason.get());
            break;
          }
        }
      }
      return found;
    }

    private SamplingSpec parseSampling(List<Observable> observables) {
      JsonNode n = root.get("sampling");
      if (!n.isObject()) {
        problems.add(
            "sampling", n.toString(), "must be an object with minimum, maximum, batch and targets");
        return null;
      }
      for (Iterator<String> it = n.fieldNames(); it.hasNext(); ) {
        String k = it.next();
        if (!Set.of("minimum", "maximum", "batch", "targets").contains(k)) {
          problems.add(
              "sampling." + k, null, "unknown key; allowed: batch, maximum, minimum, targets");
        }
      }
      Integer batch = intAt(n.get("batch"), "sampling.batch", 1, MAX_REALISATIONS, true);
      Integer min = intAt(n.get("minimum"), "sampling.minimum", 1, MAX_REALISATIONS, true);
      Integer max = intAt(n.get("maximum"), "sampling.maximum", 1, MAX_REALISATIONS, true);
      boolean ok = batch != null && min != null && max != null;
      if (ok && (min < batch || min % batch != 0)) {
        problems.add(
            "sampling.minimum",
            min.toString(),
            "must be a positive multiple of sampling.batch (" + batch + ")");
        ok = false;
      }
      if (ok && (max < min || max % batch != 0)) {
        problems.add(
            "sampling.maximum",
            max.toString(),
            "must be a multiple of sampling.batch and >= sampling.minimum");
        ok = false;
      }
      Set<String> quantities = new LinkedHashSet<>();
      Set<String> integerQuantities = new LinkedHashSet<>();
      for (Observable o : observables) {
        for (Quantity q : o.quantities()) {
          quantities.add(q.name());
          if (q.integerValued()) {
            integerQuantities.add(q.name());
          }
        }
      }
      List<SamplingSpec.Target> targets = new ArrayList<>();
      JsonNode t = n.get("targets");
      if (t == null || !t.isArray() || t.isEmpty()) {
        problems.add(
            "sampling.targets",
            t == null ? null : t.toString(),
            "required: a non-empty list of targets such as {\"quantity\": \"bott\", \"stderr\": 0.01}");
        ok = false;
      } else {
        for (int i = 0; i < t.size(); i++) {
          SamplingSpec.Target target =
              parseTarget("sampling.targets[" + i + "]", t.get(i), quantities, integerQuantities);
          if (target == null) {
            ok = false;
          } else {
            targets.add(target);
          }
        }
      }
      return ok ? new SamplingSpec(min, max, batch, targets) : null;
    }

    private SamplingSpec.Target parseTarget(
        String path, JsonNode t, Set<String> quantities, Set<String> integerQuantities) {
      if (!t.isObject()) {
        problems.add(
            path,
            t.toString(),
            "must be an object: {\"quantity\": name, \"stderr\": x} or {\"quantity\": name, \"modalFractionHalfWidth\": x}");
        return null;
      }
      JsonNode q = t.get("quantity");
      String quantity = null;
      if (q == null || !q.isTextual()) {
        problems.add(
            path + ".quantity",
            q == null ? null : q.toString(),
            "required: the name of a measured quantity");
      } else if (!quantities.contains(q.asText())) {
        problems.add(
            path + ".quantity",
            q.asText(),
            "not produced by the requested observables; produced: "
                + String.join(", ", quantities));
      } else {
        quantity = q.asText();
      }
      SamplingSpec.TargetKind kind = null;
      Double threshold = null;
      int kinds = 0;
      for (Iterator<String> it = t.fieldNames(); it.hasNext(); ) {
        String k = it.next();
        switch (k) {
          case "quantity" -> {}
          case "stderr", "modalFractionHalfWidth" -> {
            kinds++;
            kind =
                k.equals("stderr")
                    ? SamplingSpec.TargetKind.STDERR
                    : SamplingSpec.TargetKind.MODAL_FRACTION_HALF_WIDTH;
            JsonNode x = t.get(k);
            if (!x.isNumber() || !(x.asDouble() > 0) || !Double.isFinite(x.asDouble())) {
              problems.add(path + "." + k, x.toString(), "must be a positive number");
            } else {
              threshold = x.asDouble();
            }
          }
          default ->
              problems.add(
                  path + "." + k,
                  null,
                  "unknown key; allowed: quantity, stderr, modalFractionHalfWidth");
        }
      }
      if (kinds != 1) {
        problems.add(
            path, t.toString(), "give exactly one of \"stderr\" and \"modalFractionHalfWidth\"");
        return null;
      }
      if (kind == SamplingSpec.TargetKind.MODAL_FRACTION_HALF_WIDTH
          && quantity != null
          && !integerQuantities.contains(quantity)) {
        problems.add(
            path + ".quantity",
            quantity,
            "modalFractionHalfWidth needs an integer-valued invariant; those requested: "
                + String.join(", ", integerQuantities));
        return null;
      }
      return quantity == null || threshold == null
          ? null
          : new SamplingSpec.Target(kind, quantity, threshold);
    }

    private SymmetryClass effectiveClass(Model model, List<DisorderSpec> disorder) {
      boolean t = true;
      boolean c = true;
      boolean s = true;
      for (DisorderSpec d : disorder) {
        Set<Symmetry> kept = DisorderCatalog.find(d.type()).orElseThrow().keptSymmetries(model);
        t &= kept.contains(Symmetry.TIME_REVERSAL);
        c &= kept.contains(Symmetry.PARTICLE_HOLE);
        s &= kept.contains(Symmetry.CHIRAL);
      }
      return model.symmetryClass().restrictTo(t, c, s);
    }

    /** Checks names, required parameters and L; appends model and observable defaults. */
    private List<ParameterSpec> checkParameters(
        Model model,
        List<Observable> observables,
        List<DisorderSpec> disorder,
        List<ParameterSpec> given) {
      Map<String, ParameterInfo> known = new LinkedHashMap<>();
      for (ParameterInfo p : model.parameters()) {
        known.put(p.name(), p);
      }
      for (Observable o : observables) {
        for (ParameterInfo p : o.parameters()) {
          known.putIfAbsent(p.name(), p);
        }
      }
      known.put(SIZE, new ParameterInfo(SIZE, null, "linear size L in unit cells (integer >= 2)"));
      known.put(
          FERMI_ENERGY,
          new ParameterInfo(FERMI_ENERGY, 0.0, "Fermi energy in the model's energy unit"));
      if (model.name().startsWith(ANDERSON + "-")) {
        known.put(
            "dim",
            new ParameterInfo(
                "dim", (double) model.dimension(), "dimension of the anderson model (1, 2 or 3)"));
      }
      Set<String> strengthNames = new LinkedHashSet<>();
      for (DisorderSpec d : disorder) {
        if (d.strengthParameter() != null) {
          strengthNames.add(d.strengthParameter());
        }
      }
      Set<String> givenNames = new LinkedHashSet<>();
      for (ParameterSpec p : given) {
        givenNames.add(p.name());
        if (!known.containsKey(p.name()) && !strengthNames.contains(p.name())) {
          List<String> allowed = new ArrayList<>(known.keySet());
          problems.add(
              "parameters." + p.name(),
              null,
              "not a parameter of model "
                  + model.name()
                  + " or of the requested observables, and no disorder strength refers to it; allowed: "
                  + String.join(", ", allowed));
        }
        if (p.name().equals(SIZE)) {
          for (int i = 0; i < p.values().size(); i++) {
            double v = p.values().get(i);
            if (v != Math.rint(v) || v < 2 || v > MAX_LINEAR_SIZE) {
              problems.add(
                  p.swept() ? "parameters.L[" + i + "]" : "parameters.L",
                  Double.toString(v),
                  "must be an integer from 2 to " + MAX_LINEAR_SIZE);
            }
          }
        }
      }
      List<ParameterSpec> all = new ArrayList<>(given);
      for (ParameterInfo info : known.values()) {
        if (givenNames.contains(info.name())) {
          continue;
        }
        if (info.isRequired()) {
          problems.add(
              "parameters." + info.name(),
              null,
              "required by "
                  + (info.name().equals(SIZE) ? "every job" : "model " + model.name())
                  + ": "
                  + info.description());
        } else if (!Double.isNaN(info.defaultValue())) {
          // NaN marks an optional parameter with no value: it stays absent from the point.
          all.add(new ParameterSpec(info.name(), List.of(info.defaultValue()), false));
        }
      }
      return all;
    }

    /**
     * Each observable against each disorder kind ({@link Observable#whyNotApplicableWith}), e.g.
     * vacancies' far-away levels.
     */
    private void checkObservablesWithDisorder(
        List<Observable> observables, List<DisorderSpec> disorder, List<ParameterSpec> parameters) {
      Map<String, List<Double>> values = new LinkedHashMap<>();
      for (ParameterSpec p : parameters) {
        values.put(p.name(), p.values());
      }
      JsonNode list = root.get("observables");
      for (Observable o : observables) {
        int index = 0;
        for (int i = 0; list != null && i < list.size(); i++) {
          if (o.name().equals(list.get(i).asText())) {
            index = i;
          }
        }
        String path = "observables[" + index + "]";
        Set<String> reported = new LinkedHashSet<>();
        for (DisorderSpec d : disorder) {
          DisorderKind kind = DisorderCatalog.find(d.type()).orElseThrow();
          o.whyNotApplicableWith(kind, values)
              .filter(reported::add)
              .ifPresent(reason -> problems.add(path, o.name(), reason));
        }
      }
    }

    private void checkObservables(
        Model model,
        Boundary boundary,
        SymmetryClass effective,
        List<Observable> observables,
        List<String> disorderTypes) {
      JsonNode list = root.get("observables");
      for (Observable o : observables) {
        int index = 0;
        for (int i = 0; list != null && i < list.size(); i++) {
          if (o.name().equals(list.get(i).asText())) {
            index = i;
          }
        }
        String path = "observables[" + index + "]";
        o.whyNotApplicable(model, boundary, effective, disorderTypes)
            .ifPresent(reason -> problems.add(path, o.name(), reason));
      }
    }
  }

  /**
   * Canonical JSON text of a spec (keys sorted, no whitespace); what {@link JobSpec#specHash}
   * hashes.
   */
  public static String canonicalText(String text) {
    try {
      JsonNode root = STRICT.readTree(text);
      return new String(
          CANONICAL.writeValueAsBytes(CANONICAL.treeToValue(root, Object.class)),
          StandardCharsets.UTF_8);
    } catch (JsonProcessingException e) {
      throw new InvalidInputException("", null, "not valid JSON: " + e.getOriginalMessage());
    }
  }
}
