package hopstat.spec;

import com.fasterxml.jackson.databind.JsonNode;
import hopstat.model.CustomModelDefinition;
import hopstat.model.CustomModelDefinition.Amplitude;
import hopstat.model.CustomModelDefinition.Onsite;
import hopstat.model.CustomModelDefinition.Orbital;
import hopstat.model.CustomModelDefinition.Term;
import hopstat.model.Symmetry;
import hopstat.model.SymmetryClass;
import hopstat.model.SymmetryOperator;
import hopstat.task.InvalidInputException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Pattern;

/**
 * Parses and validates the {@code "lattice"} block of a {@code "model": "custom"} spec into a
 * {@link CustomModelDefinition}. Every problem goes to the caller's collector with its field path
 * (e.g. {@code lattice.hoppings[3].to}); the definition is returned only when there was none.
 */
final class CustomModelParser {

  /** Tolerance on ‖U U* ∓ 1‖_max when checking a declared T² or C² against the class. */
  static final double SQUARE_TOLERANCE = 1e-10;

  private static final Set<String> KEYS =
      Set.of(
          "dimension",
          "vectors",
          "orbitals",
          "onsite",
          "hoppings",
          "pairings",
          "class",
          "symmetries");
  private static final Pattern ORBITAL_NAME = Pattern.compile("[A-Za-z][A-Za-z0-9_]{0,31}");
  private static final Map<String, Symmetry> OPERATOR_KEYS =
      Map.of("T", Symmetry.TIME_REVERSAL, "C", Symmetry.PARTICLE_HOLE, "S", Symmetry.CHIRAL);

  private final JsonNode lattice;
  private final Set<String> parameterNames;
  private final InvalidInputException.Collector problems;
  private boolean ok = true;
  private final Map<String, Integer> orbitalIndex = new LinkedHashMap<>();

  private CustomModelParser(
      JsonNode lattice, Set<String> parameterNames, InvalidInputException.Collector problems) {
    this.lattice = lattice;
    this.parameterNames = parameterNames;
    this.problems = problems;
  }

  /**
   * @param lattice the block, read
   * @param parameterNames the names defined in the spec's {@code parameters}
   * @param problems receives every problem found
   * @return the definition, or null if any problem was found
   */
  static CustomModelDefinition parse(
      JsonNode lattice, Set<String> parameterNames, InvalidInputException.Collector problems) {
    return new CustomModelParser(lattice, parameterNames, problems).parse();
  }

  private void add(String path, Object value, String reason) {
    problems.add(path, value, reason);
    ok = false;
  }

  private CustomModelDefinition parse() {
    if (!lattice.isObject()) {
      add(
          "lattice",
          lattice.toString(),
          "must be an object with dimension, vectors, orbitals, onsite, hoppings, class");
      return null;
    }
    for (Iterator<String> it = lattice.fieldNames(); it.hasNext(); ) {
      String k = it.next();
      if (!KEYS.contains(k)) {
        add(
            "lattice." + k,
            null,
            "unknown key; allowed: " + String.join(", ", new TreeSet<>(KEYS)));
      }
    }
    JsonNode dimNode = lattice.get("dimension");
    if (dimNode == null
        || !dimNode.isIntegralNumber()
        || dimNode.asInt() < 1
        || dimNode.asInt() > 3) {
      add("lattice.dimension", dimNode == null ? null : dimNode.toString(), "required: 1, 2 or 3");
      return null;
    }
    int d = dimNode.asInt();
    List<List<Double>> vectors = parseVectors(d);
    List<Orbital> orbitals = parseOrbitals(d);
    List<Onsite> onsite = parseOnsite();
    List<Term> hoppings = parseTerms("hoppings", d, true);
    List<Term> pairings = parseTerms("pairings", d, false);
    SymmetryClass klass = null;
    JsonNode c = lattice.get("class");
    if (c == null || !c.isTextual() || SymmetryClass.parse(c.asText()).isEmpty()) {
      add(
          "lattice.class",
          c == null ? null : c.toString(),
          "required: an Altland-Zirnbauer class, one of "
              + Arrays.toString(SymmetryClass.values()));
    } else {
      klass = SymmetryClass.parse(c.asText()).get();
    }
    int perCell = pairings.isEmpty() ? orbitals.size() : 2 * orbitals.size();
    List<SymmetryOperator> symmetries =
        klass == null || orbitals.isEmpty()
            ? List.of()
            : parseSymmetries(klass, perCell, !pairings.isEmpty());
    if (!ok) {
      return null;
    }
    return new CustomModelDefinition(
        d, vectors, orbitals, onsite, hoppings, pairings, klass, symmetries);
  }

  private List<List<Double>> parseVectors(int d) {
    JsonNode v = lattice.get("vectors");
    List<List<Double>> vectors = new ArrayList<>();
    if (v == null || !v.isArray() || v.size() != d) {
      add(
          "lattice.vectors",
          v == null ? null : v.toString(),
          "required: " + d + " lattice vector(s) of " + d + " number(s) each");
      return vectors;
    }
    for (int i = 0; i < d; i++) {
      List<Double> vec = numbers("lattice.vectors[" + i + "]", v.get(i), d);
      if (vec != null) {
        vectors.add(vec);
      }
    }
    return vectors;
  }

  private List<Double> numbers(String path, JsonNode n, int length) {
    if (n == null || !n.isArray() || n.size() != length) {
      add(
          path,
          n == null ? null : n.toString(),
          "must be a list of " + length + " number(s) (one per dimension)");
      return null;
    }
    List<Double> out = new ArrayList<>();
    for (int k = 0; k < length; k++) {
      JsonNode x = n.get(k);
      if (!x.isNumber() || !Double.isFinite(x.asDouble())) {
        add(path + "[" + k + "]", x.toString(), "must be a finite number");
        return null;
      }
      out.add(x.asDouble());
    }
    return out;
  }

  private List<Orbital> parseOrbitals(int d) {
    List<Orbital> out = new ArrayList<>();
    JsonNode n = lattice.get("orbitals");
    if (n == null || !n.isArray() || n.isEmpty()) {
      add(
          "lattice.orbitals",
          n == null ? null : n.toString(),
          "required: a non-empty list of {\"name\": ..., \"position\": [...]}");
      return out;
    }
    for (int i = 0; i < n.size(); i++) {
      String path = "lattice.orbitals[" + i + "]";
      JsonNode o = n.get(i);
      JsonNode name = o.get("name");
      if (!o.isObject()
          || name == null
          || !name.isTextual()
          || !ORBITAL_NAME.matcher(name.asText()).matches()) {
        add(
            path + ".name",
            name == null ? null : name.toString(),
            "required: a name of letters, digits and '_' starting with a letter");
        continue;
      }
      for (Iterator<String> it = o.fieldNames(); it.hasNext(); ) {
        String k = it.next();
        if (!k.equals("name") && !k.equals("position")) {
          add(path + "." + k, null, "unknown key; allowed: name, position");
        }
      }
      if (orbitalIndex.putIfAbsent(name.asText(), i) != null) {
        add(path + ".name", name.asText(), "listed twice");
        continue;
      }
      List<Double> position =
          o.has("position")
              ? numbers(path + ".position", o.get("position"), d)
              : java.util.Collections.nCopies(d, 0.0);
      out.add(
          new Orbital(
              name.asText(), position == null ? java.util.Collections.nCopies(d, 0.0) : position));
    }
    return out;
  }

  private Integer orbital(String path, JsonNode n) {
    if (n == null || !n.isTextual() || !orbitalIndex.containsKey(n.asText())) {
      add(
          path,
          n == null ? null : n.asText(),
          (n == null ? "required" : "unknown orbital '" + n.asText() + "'")
              + "; known: "
              + String.join(", ", orbitalIndex.keySet()));
      return null;
    }
    return orbitalIndex.get(n.asText());
  }

  private List<Onsite> parseOnsite() {
    List<Onsite> out = new ArrayList<>();
    JsonNode n = lattice.get("onsite");
    if (n == null) {
      return out;
    }
    if (!n.isArray()) {
      add("lattice.onsite", n.toString(), "must be a list of {\"orbital\": name, \"value\": ...}");
      return out;
    }
    Set<Integer> seen = new java.util.HashSet<>();
    for (int i = 0; i < n.size(); i++) {
      String path = "lattice.onsite[" + i + "]";
      JsonNode e = n.get(i);
      if (!e.isObject()) {
        add(path, e.toString(), "must be an object {\"orbital\": name, \"value\": ...}");
        continue;
      }
      unknownKeys(path, e, Set.of("orbital", "value"));
      Integer o = orbital(path + ".orbital", e.get("orbital"));
      Amplitude a = amplitude(path + ".value", e.get("value"));
      if (o != null && !seen.add(o)) {
        add(
            path + ".orbital",
            e.get("orbital").asText(),
            "listed twice; give one onsite value per orbital");
      } else if (a != null && a.im() != 0.0) {
        // A diagonal entry with an imaginary part makes the onsite block non-Hermitian.
        add(
            path + ".value",
            e.get("value").toString(),
            "the onsite block must be Hermitian: an onsite energy must be real (put complex couplings between orbitals in hoppings with a zero cell offset)");
      } else if (o != null && a != null) {
        out.add(new Onsite(o, a));
      }
    }
    return out;
  }

  private List<Term> parseTerms(String key, int d, boolean hopping) {
    List<Term> out = new ArrayList<>();
    JsonNode n = lattice.get(key);
    if (n == null) {
      if (hopping) {
        add(
            "lattice.hoppings",
            null,
            "required: a list of {\"cell\": [...], \"from\": orbital, \"to\": orbital, \"amplitude\": ...}");
      }
      return out;
    }
    if (!n.isArray()) {
      add(
          "lattice." + key,
          n.toString(),
          "must be a list of {\"cell\": [...], \"from\": orbital, \"to\": orbital, \"amplitude\": ...}");
      return out;
    }
    for (int i = 0; i < n.size(); i++) {
      String path = "lattice." + key + "[" + i + "]";
      JsonNode t = n.get(i);
      if (!t.isObject()) {
        add(path, t.toString(), "must be an object {\"cell\", \"from\", \"to\", \"amplitude\"}");
        continue;
      }
      unknownKeys(path, t, Set.of("cell", "from", "to", "amplitude"));
      List<Integer> cell = null;
      JsonNode c = t.get("cell");
      if (c == null || !c.isArray() || c.size() != d) {
        add(
            path + ".cell",
            c == null ? null : c.toString(),
            "required: " + d + " integer cell offset(s), one per dimension");
      } else {
        cell = new ArrayList<>();
        for (int k = 0; k < d; k++) {
          if (!c.get(k).isIntegralNumber() || !c.get(k).canConvertToInt()) {
            add(path + ".cell[" + k + "]", c.get(k).toString(), "must be an integer");
            cell = null;
            break;
          }
          cell.add(c.get(k).asInt());
        }
      }
      Integer from = orbital(path + ".from", t.get("from"));
      Integer to = orbital(path + ".to", t.get("to"));
      Amplitude a = amplitude(path + ".amplitude", t.get("amplitude"));
      if (cell != null && from != null && to != null && a != null) {
        if (from.equals(to) && cell.stream().allMatch(x -> x == 0)) {
          add(
              path,
              t.toString(),
              hopping
                  ? "joins an orbital to itself in the same cell: that is an onsite energy, give it in lattice.onsite"
                  : "pairs an orbital with itself in the same cell, which vanishes by Fermi statistics");
          continue;
        }
        out.add(new Term(cell, from, to, a));
      }
    }
    return out;
  }

  private void unknownKeys(String path, JsonNode n, Set<String> allowed) {
    for (Iterator<String> it = n.fieldNames(); it.hasNext(); ) {
      String k = it.next();
      if (!allowed.contains(k)) {
        add(
            path + "." + k,
            null,
            "unknown key; allowed: " + String.join(", ", new TreeSet<>(allowed)));
      }
    }
  }

  /** A number, a parameter name, {"re", "im"} or {"scale", "re", "im"}. */
  private Amplitude amplitude(String path, JsonNode n) {
    if (n == null) {
      add(
          path,
          null,
          "required: a number, a parameter name, {\"re\": x, \"im\": y} or {\"scale\": name, \"re\": x, \"im\": y}");
      return null;
    }
    if (n.isNumber()) {
      return Double.isFinite(n.asDouble())
          ? Amplitude.of(n.asDouble(), 0.0)
          : invalid(path, n, "must be finite");
    }
    if (n.isTextual()) {
      return parameter(path, n.asText()) ? new Amplitude(n.asText(), 1.0, 0.0) : null;
    }
    if (!n.isObject()) {
      return invalid(
          path,
          n,
          "must be a number, a parameter name or an object {\"re\", \"im\"} / {\"scale\", \"re\", \"im\"}");
    }
    unknownKeys(path, n, Set.of("scale", "re", "im"));
    String scale = null;
    JsonNode s = n.get("scale");
    if (s != null) {
      if (!s.isTextual()) {
        return invalid(path + ".scale", s, "must be a parameter name");
      }
      if (!parameter(path + ".scale", s.asText())) {
        return null;
      }
      scale = s.asText();
    } else if (!n.has("re") && !n.has("im")) {
      return invalid(path, n, "give \"re\" and/or \"im\"");
    }
    double[] parts = {scale == null ? 0.0 : 1.0, 0.0};
    String[] keys = {"re", "im"};
    for (int k = 0; k < 2; k++) {
      JsonNode x = n.get(keys[k]);
      if (x != null) {
        if (!x.isNumber() || !Double.isFinite(x.asDouble())) {
          return invalid(path + "." + keys[k], x, "must be a finite number");
        }
        parts[k] = x.asDouble();
      }
    }
    return new Amplitude(scale, parts[0], parts[1]);
  }

  private boolean parameter(String path, String name) {
    if (!parameterNames.contains(name)) {
      add(
          path,
          name,
          "unknown parameter name; define it in \"parameters\" (defined: "
              + String.join(", ", new TreeSet<>(parameterNames))
              + ")");
      return false;
    }
    return true;
  }

  private Amplitude invalid(String path, JsonNode n, String reason) {
    add(path, n.toString(), reason);
    return null;
  }

  private List<SymmetryOperator> parseSymmetries(SymmetryClass klass, int perCell, boolean bdg) {
    List<SymmetryOperator> out = new ArrayList<>();
    JsonNode n = lattice.get("symmetries");
    if (n != null && !n.isObject()) {
      add("lattice.symmetries", n.toString(), "must be an object with keys T, C, S");
      return out;
    }
    Map<Symmetry, SymmetryOperator> declared = new LinkedHashMap<>();
    if (n != null) {
      for (Iterator<Map.Entry<String, JsonNode>> it = n.fields(); it.hasNext(); ) {
        Map.Entry<String, JsonNode> e = it.next();
        String path = "lattice.symmetries." + e.getKey();
        Symmetry s = OPERATOR_KEYS.get(e.getKey());
        if (s == null) {
          add(path, null, "unknown key; allowed: C, S, T");
          continue;
        }
        if (!has(klass, s)) {
          add(
              path,
              null,
              "class "
                  + klass
                  + " has no "
                  + e.getKey()
                  + "; remove it or declare a class that has it");
          continue;
        }
        SymmetryOperator op = operator(path, s, e.getValue(), perCell, klass);
        if (op != null) {
          declared.put(s, op);
        }
      }
    }
    for (String key : new TreeSet<>(OPERATOR_KEYS.keySet())) {
      Symmetry s = OPERATOR_KEYS.get(key);
      // In Nambu form C = tau_x K is structural and supplied by the model when not declared.
      boolean supplied = bdg && s == Symmetry.PARTICLE_HOLE;
      if (has(klass, s) && !declared.containsKey(s) && !supplied) {
        add(
            "lattice.symmetries." + key,
            null,
            "class "
                + klass
                + " has "
                + key
                + ": declare its operator ({\"matrix\": [[...]], \"antiunitary\": "
                + (s != Symmetry.CHIRAL)
                + "}) so that it can be checked");
      }
    }
    out.addAll(declared.values());
    return out;
  }

  private static boolean has(SymmetryClass k, Symmetry s) {
    return switch (s) {
      case TIME_REVERSAL -> k.hasTimeReversal();
      case PARTICLE_HOLE -> k.hasParticleHole();
      case CHIRAL -> k.hasChiral();
    };
  }

  private SymmetryOperator operator(
      String path, Symmetry s, JsonNode n, int perCell, SymmetryClass klass) {
    if (!n.isObject()) {
      invalid(path, n, "must be an object {\"matrix\": [[...]], \"antiunitary\": true|false}");
      return null;
    }
    unknownKeys(path, n, Set.of("matrix", "antiunitary"));
    boolean antiunitary = s != Symmetry.CHIRAL;
    JsonNode a = n.get("antiunitary");
    if (a != null && (!a.isBoolean() || a.asBoolean() != antiunitary)) {
      invalid(
          path + ".antiunitary",
          a,
          s == Symmetry.CHIRAL ? "S is unitary: false" : "T and C are antiunitary (U K): true");
      return null;
    }
    JsonNode m = n.get("matrix");
    if (m == null || !m.isArray() || m.size() != perCell) {
      add(
          path + ".matrix",
          m == null ? null : m.toString(),
          "required: a "
              + perCell
              + " x "
              + perCell
              + " matrix (one row per orbital"
              + (perCell % 2 == 0 && lattice.has("pairings")
                  ? " in Nambu order: particles, then holes"
                  : "")
              + ")");
      return null;
    }
    double[][] re = new double[perCell][perCell];
    double[][] im = new double[perCell][perCell];
    for (int i = 0; i < perCell; i++) {
      JsonNode row = m.get(i);
      if (!row.isArray() || row.size() != perCell) {
        invalid(path + ".matrix[" + i + "]", row, "must be a row of " + perCell + " entries");
        return null;
      }
      for (int j = 0; j < perCell; j++) {
        JsonNode x = row.get(j);
        String p = path + ".matrix[" + i + "][" + j + "]";
        if (x.isNumber()) {
          re[i][j] = x.asDouble();
        } else if (isComplexEntry(x)) {
          re[i][j] = x.path("re").asDouble(0.0);
          im[i][j] = x.path("im").asDouble(0.0);
        } else {
          invalid(p, x, "must be a number or {\"re\": x, \"im\": y}");
          return null;
        }
      }
    }
    SymmetryOperator op;
    try {
      op = SymmetryOperator.local(s, re, im);
    } catch (IllegalArgumentException e) {
      invalid(
          path + ".matrix",
          m,
          "not unitary (U U^dagger = 1 within " + SymmetryOperator.UNITARITY_TOLERANCE + ")");
      return null;
    }
    if (s != Symmetry.CHIRAL) {
      int expected =
          s == Symmetry.TIME_REVERSAL ? klass.timeReversalSquare() : klass.particleHoleSquare();
      // (U K)^2 = U U*; the class fixes it to +1 or -1 (Altland & Zirnbauer, PRB 55, 1142 (1997)).
      if (!isSquare(re, im, expected)) {
        invalid(
            path + ".matrix",
            m,
            "class "
                + klass
                + " needs "
                + (s == Symmetry.TIME_REVERSAL ? "T" : "C")
                + "^2 = U U* = "
                + (expected > 0 ? "+1" : "-1"));
        return null;
      }
    }
    return op;
  }

  private static boolean isSquare(double[][] re, double[][] im, int sign) {
    int o = re.length;
    for (int i = 0; i < o; i++) {
      for (int j = 0; j < o; j++) {
        double sr = 0;
        double si = 0;
        for (int k = 0; k < o; k++) {
          // U_ik conj(U_kj)
          sr += re[i][k] * re[k][j] + im[i][k] * im[k][j];
          si += im[i][k] * re[k][j] - re[i][k] * im[k][j];
        }
        if (Math.abs(sr - (i == j ? sign : 0)) > SQUARE_TOLERANCE
            || Math.abs(si) > SQUARE_TOLERANCE) {
          return false;
        }
      }
    }
    return true;
  }

  /** {"re": x, "im": y} with at least one part, each part a number, no other keys. */
  private static boolean isComplexEntry(JsonNode x) {
    if (!x.isObject() || x.isEmpty() || x.size() > 2) {
      return false;
    }
    for (Iterator<Map.Entry<String, JsonNode>> it = x.fields(); it.hasNext(); ) {
      Map.Entry<String, JsonNode> e = it.next();
      if (!(e.getKey().equals("re") || e.getKey().equals("im")) || !e.getValue().isNumber()) {
        return false;
      }
    }
    return true;
  }
}
