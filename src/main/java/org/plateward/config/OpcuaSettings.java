package org.plateward.config;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.Iterator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.plateward.signals.EdgeUnit;
import org.plateward.signals.Signal;

/**
 * The {@code [opcua]} section: how Plateward connects to a plant's OPC UA server and which node
 * carries each canonical signal. Durations are written with a unit ({@code "500 ms"}, {@code
 * "1 s"}, {@code "2 min"}) and held in seconds.
 *
 * <pre>
 * [opcua]
 * endpoint = "opc.tcp://127.0.0.1:4841/plateward/plant"
 * security_policy = "None"          # None | Basic256Sha256 | Aes128_Sha256_RsaOaep | Aes256_Sha256_RsaPss
 * security_mode = "None"            # None | Sign | SignAndEncrypt
 * allow_insecure_remote = false     # optional: permit policy None off loopback
 * application_uri = "urn:plateward:monitor"
 * pki_dir = "data/pki"              # own/, trusted/certs/, issuer/certs/, rejected/
 * namespace = "urn:plateward:sim-plant"   # optional: for tag nodes written without ns/nsu
 * publishing_interval = "500 ms"
 * request_timeout = "10 s"
 * frame_period = "1 s"              # the estimator clock
 * frame_delay = "500 ms"            # how long a frame waits for late samples
 * stale_after = 3                   # multiples of a tag's sampling interval
 * clock_skew_limit = "2 s"
 *
 * [opcua.auth]
 * kind = "anonymous"                # or "username", with username and password_env or password_file
 *
 * [opcua.tags.ref_gas_flow_nm3_h]
 * node = "s=Skid-R1/Reforming/FeedGasFlow"
 * unit = "Nm3/h"
 * sampling_interval = "500 ms"
 * deadband = 0.0                    # optional, absolute, in the tag's unit
 * </pre>
 *
 * <p>Relative paths ({@code pki_dir}, {@code password_file}) are taken from the working
 * directory. A password never appears in the file: only the name of an environment variable or
 * of a file holding it.
 *
 * @param endpointUrl opc.tcp URL of the server
 * @param securityPolicy Milo/OPC UA security policy name, e.g. {@code Basic256Sha256}
 * @param securityMode message security mode name: None, Sign or SignAndEncrypt
 * @param allowInsecureRemote whether policy None is permitted for a non-loopback endpoint
 * @param auth user identity
 * @param applicationUri our application URI (and the SAN URI of our certificate)
 * @param pkiDir folder of our certificate and of the trusted / rejected server certificates
 * @param namespaceUri namespace for tag nodes written without one; null when not given
 * @param publishingIntervalS requested subscription publishing interval, s
 * @param requestTimeoutS request timeout, s
 * @param framePeriodS period of the aligned frames (estimator clock), s
 * @param frameDelayS delay before a frame is closed, to let late samples in, s
 * @param staleMultiple a tag with no update for this many sampling intervals is stale
 * @param clockSkewLimitS SourceTimestamp vs local receive time beyond this is flagged, s
 * @param tags the tag map; signals not listed are never measured (MISSING in every frame)
 */
public record OpcuaSettings(
    String endpointUrl,
    String securityPolicy,
    String securityMode,
    boolean allowInsecureRemote,
    Authentication auth,
    String applicationUri,
    Path pkiDir,
    String namespaceUri,
    double publishingIntervalS,
    double requestTimeoutS,
    double framePeriodS,
    double frameDelayS,
    double staleMultiple,
    double clockSkewLimitS,
    Map<Signal, Tag> tags) {

  /** Security policy names accepted (OPC UA policy URIs end with these). */
  public static final List<String> POLICIES =
      List.of("None", "Basic256Sha256", "Aes128_Sha256_RsaOaep", "Aes256_Sha256_RsaPss");

  public static final List<String> MODES = List.of("None", "Sign", "SignAndEncrypt");

  static final List<String> KEYS =
      List.of("endpoint", "security_policy", "security_mode", "allow_insecure_remote",
          "application_uri", "pki_dir", "namespace", "publishing_interval", "request_timeout",
          "frame_period", "frame_delay", "stale_after", "clock_skew_limit", "auth", "tags");

  private static final Pattern NODE_ID =
      Pattern.compile("(?:(?:ns=[0-9]+|nsu=[^;]+);)?(?:i=[0-9]+|s=.+|g=[0-9a-fA-F-]{36}|b=.+)");

  public OpcuaSettings {
    EnumMap<Signal, Tag> copy = new EnumMap<>(Signal.class);
    copy.putAll(tags);
    tags = Collections.unmodifiableMap(copy);
  }

  /** The user identity: anonymous, or a username whose password lives outside the config. */
  public record Authentication(Kind kind, String username, String passwordEnv, Path passwordFile) {
    public enum Kind {
      ANONYMOUS,
      USERNAME
    }

    public static Authentication anonymous() {
      return new Authentication(Kind.ANONYMOUS, null, null, null);
    }

    /**
     * The password, read now from the environment variable or the file (first line, without
     * the line end).
     *
     * @throws IllegalStateException with a plain message when the variable is unset or the file
     *     cannot be read
     */
    public String password() {
      if (kind != Kind.USERNAME) {
        throw new IllegalStateException("anonymous identity has no password");
      }
      if (passwordEnv != null) {
        String p = System.getenv(passwordEnv);
        if (p == null) {
          throw new IllegalStateException(
              "OPC UA password: environment variable " + passwordEnv + " is not set");
        }
        return p;
      }
      try {
        List<String> lines = Files.readAllLines(passwordFile, StandardCharsets.UTF_8);
        return lines.isEmpty() ? "" : lines.get(0);
      } catch (IOException e) {
        throw new IllegalStateException(
            "OPC UA password: cannot read " + passwordFile + " (" + e.getMessage() + ")");
      }
    }

    @Override
    public String toString() {
      return kind == Kind.ANONYMOUS ? "anonymous" : "username " + username;
    }
  }

  /**
   * One entry of the tag map.
   *
   * @param signal the canonical signal
   * @param nodeId the node, in OPC UA string form ({@code ns=2;s=...}, {@code
   *     nsu=urn:...;s=...}, or {@code s=...} with the section's namespace)
   * @param unit the unit the server delivers the value in
   * @param samplingIntervalS requested sampling interval, s
   * @param deadband absolute deadband in {@code unit}; 0 for none
   */
  public record Tag(Signal signal, String nodeId, EdgeUnit unit, double samplingIntervalS, double deadband) {}

  /**
   * Reads the {@code [opcua]} section of a file on its own. Nothing is written.
   *
   * @throws InvalidConfigException with every problem, each as file, line, field and message
   */
  public static OpcuaSettings load(Path file) throws InvalidConfigException {
    TomlDocument doc = TomlDocument.read(file);
    ErrorList errors = new ErrorList(file);
    OpcuaSettings s = read(doc, errors);
    errors.throwIfAny();
    return s;
  }

  /** Reads the {@code [opcua]} section of a parsed document; problems go to {@code errors}. */
  static OpcuaSettings read(TomlDocument doc, ErrorList errors) {
    Section top = Section.top(doc, errors, "opcua", KEYS);
    if (!top.present()) {
      return null;
    }
    String endpoint = top.text("endpoint", null);
    if (endpoint != null && !endpoint.startsWith("opc.tcp://")) {
      top.error("endpoint", "must be an opc.tcp:// URL, got \"" + endpoint + "\"");
    }
    String policy = top.choice("security_policy", POLICIES, null);
    String mode = top.choice("security_mode", MODES, null);
    if (policy != null && mode != null && policy.equals("None") != mode.equals("None")) {
      top.error("security_mode", "security_policy \"" + policy + "\" needs security_mode "
          + (policy.equals("None") ? "\"None\"" : "\"Sign\" or \"SignAndEncrypt\"")
          + ", got \"" + mode + "\"");
    }
    boolean allowRemote = top.flag("allow_insecure_remote", false);
    String appUri = top.text("application_uri", "urn:plateward:monitor");
    String pki = top.text("pki_dir", "data/pki");
    String namespace = top.text("namespace", "");
    double publishing = top.duration("publishing_interval", 0.5);
    double timeout = top.duration("request_timeout", 10.0);
    double period = top.duration("frame_period", 1.0);
    double delay = top.duration("frame_delay", 0.5);
    double staleAfter = top.number("stale_after", 3.0);
    if (!Double.isNaN(staleAfter) && staleAfter < 1.0) {
      top.error("stale_after", "must be at least 1 (multiples of the sampling interval), got "
          + top.written("stale_after"));
    }
    double skew = top.duration("clock_skew_limit", 2.0);

    Authentication auth = readAuth(doc, errors, top);
    Map<Signal, Tag> tags = readTags(doc, errors, top, namespace);
    top.finish();
    return new OpcuaSettings(endpoint, policy, mode, allowRemote, auth, appUri,
        pki == null ? null : Path.of(pki), namespace.isEmpty() ? null : namespace, publishing,
        timeout, period, delay, staleAfter, skew, tags);
  }

  private static Authentication readAuth(TomlDocument doc, ErrorList errors, Section top) {
    Section a = top.child("auth", List.of("kind", "username", "password_env", "password_file"));
    if (!a.present()) {
      return Authentication.anonymous();
    }
    String kind = a.choice("kind", List.of("anonymous", "username"), null);
    Authentication out = Authentication.anonymous();
    if ("username".equals(kind)) {
      String user = a.text("username", null);
      String env = a.optionalText("password_env");
      String file = a.optionalText("password_file");
      if (env == null && file == null) {
        a.error("kind", "a username identity needs password_env (name of an environment "
            + "variable) or password_file (a file holding the password); the password itself "
            + "never goes in the configuration");
      } else if (env != null && file != null) {
        a.error("password_file", "give password_env or password_file, not both");
      }
      out = new Authentication(Authentication.Kind.USERNAME, user, env, file == null ? null : Path.of(file));
    } else if ("anonymous".equals(kind)) {
      for (String k : List.of("username", "password_env", "password_file")) {
        if (a.has(k)) {
          a.error(k, "only for kind = \"username\"");
        }
      }
    }
    if (a.has("password")) {
      a.error("password", "a password never goes in the configuration; use password_env or "
          + "password_file");
      a.markKnown("password");
    }
    a.finish();
    return out;
  }

  private static Map<Signal, Tag> readTags(
      TomlDocument doc, ErrorList errors, Section top, String namespace) {
    Map<Signal, Tag> tags = new EnumMap<>(Signal.class);
    JsonNode n = top.raw("tags");
    if (n == null) {
      top.error("tags", "missing; add one [opcua.tags.<signal id>] table per measured signal");
      return tags;
    }
    if (!n.isObject()) {
      top.error("tags", "must be tables [opcua.tags.<signal id>]");
      return tags;
    }
    List<String> ids = new ArrayList<>();
    for (Signal s : Signal.values()) {
      ids.add(s.id());
    }
    for (Iterator<String> it = n.fieldNames(); it.hasNext(); ) {
      String id = it.next();
      Section t = top.child("tags." + id, List.of("node", "unit", "sampling_interval", "deadband"));
      Signal signal = Signal.byId(id);
      if (signal == null) {
        String near = Spelling.closest(id, ids);
        t.errorHere(near != null
            ? "no signal \"" + id + "\"; did you mean \"" + near + "\"?"
            : "no signal \"" + id + "\" (signals: " + String.join(", ", ids) + ")");
        continue;
      }
      String node = t.text("node", null);
      if (node != null) {
        if (!NODE_ID.matcher(node).matches()) {
          t.error("node", "not an OPC UA NodeId such as \"ns=2;s=Skid/Temp\", "
              + "\"nsu=urn:site:plant;s=Skid/Temp\" or \"s=Skid/Temp\", got \"" + node + "\"");
          node = null;
        } else if (!node.startsWith("ns") && namespace.isEmpty()) {
          t.error("node", "has no namespace; write ns=<index>; or nsu=<uri>; before it, or set "
              + "namespace in [opcua]");
          node = null;
        } else if (!node.startsWith("ns")) {
          node = "nsu=" + namespace + ";" + node;
        }
      }
      EdgeUnit unit = null;
      String unitText = t.text("unit", null);
      if (unitText != null) {
        for (EdgeUnit u : EdgeUnit.values()) {
          if (u.label().equals(unitText)) {
            unit = u;
          }
        }
        if (unit == null) {
          List<String> labels = new ArrayList<>();
          for (EdgeUnit u : EdgeUnit.values()) {
            if (u.siLabel().equals(signal.unit().siLabel())) {
              labels.add(u.label());
            }
          }
          t.error("unit", "unknown unit \"" + unitText + "\" for " + id + " (use one of: "
              + String.join(", ", labels) + ")");
        } else if (!unit.siLabel().equals(signal.unit().siLabel())) {
          t.error("unit", "\"" + unitText + "\" does not measure what " + id + " measures ("
              + signal.unit().siLabel() + " in SI); expected e.g. \"" + signal.unit().label() + "\"");
          unit = null;
        }
      }
      double sampling = t.duration("sampling_interval", Double.NaN);
      double deadband = t.number("deadband", 0.0);
      if (!Double.isNaN(deadband) && deadband < 0.0) {
        t.error("deadband", "must not be negative, got " + t.written("deadband"));
      }
      t.finish();
      if (node != null && unit != null && sampling > 0.0 && deadband >= 0.0) {
        tags.put(signal, new Tag(signal, node, unit, sampling, deadband));
      }
    }
    return tags;
  }

  /** Parses a duration such as {@code "500 ms"}, {@code "1 s"}, {@code "2 min"}; seconds, or NaN when malformed. */
  static double parseDurationS(String text) {
    try {
      return Quantity.parse(text, Dimension.TIME).valueSi();
    } catch (QuantityFormatException e) {
      return Double.NaN;
    }
  }


  /** One table of the section, with optional keys and defaults. */
  private static final class Section {
    private final TomlDocument doc;
    private final ErrorList errors;
    private final String path;
    private final JsonNode node;
    private final Set<String> known = new LinkedHashSet<>();
    private final List<String> keys;

    private Section(TomlDocument doc, ErrorList errors, String path, JsonNode node, List<String> keys) {
      this.doc = doc;
      this.errors = errors;
      this.path = path;
      this.node = node;
      this.keys = keys;
    }

    static Section top(TomlDocument doc, ErrorList errors, String name, List<String> keys) {
      JsonNode n = doc.root().get(name);
      if (n != null && !n.isObject()) {
        errors.add(doc.lineOf(name, 1), name, "must be a table [" + name + "]");
        n = null;
      }
      return new Section(doc, errors, name, n, keys);
    }

    Section child(String relative, List<String> childKeys) {
      JsonNode n = node;
      for (String part : relative.split("\\.", 2)) {
        n = n == null ? null : n.get(part);
        if (relative.startsWith("tags.") && part.equals("tags")) {
          known.add("tags");
          n = n == null ? null : n.get(relative.substring(5));
          break;
        }
      }
      known.add(relative.split("\\.")[0]);
      if (n != null && !n.isObject()) {
        errors.add(line(path + "." + relative), path + "." + relative,
            "must be a table [" + path + "." + relative + "]");
        n = null;
      }
      return new Section(doc, errors, path + "." + relative, n, childKeys);
    }

    boolean present() {
      return node != null;
    }

    boolean has(String key) {
      return node != null && node.has(key);
    }

    void markKnown(String key) {
      known.add(key);
    }

    JsonNode raw(String key) {
      known.add(key);
      return node == null ? null : node.get(key);
    }

    private int line(String dotted) {
      int header = doc.lineOf(path, 1);
      return doc.lineOf(dotted, header);
    }

    void error(String key, String message) {
      errors.add(line(path + "." + key), path + "." + key, message);
    }

    void errorHere(String message) {
      errors.add(doc.lineOf(path, 1), path, message);
    }

    String written(String key) {
      JsonNode v = node == null ? null : node.get(key);
      return v == null ? "" : v.isTextual() ? "\"" + v.asText() + "\"" : v.toString();
    }

    /** A text value; {@code fallback} when absent, and an error when absent with no fallback. */
    String text(String key, String fallback) {
      JsonNode v = raw(key);
      if (v == null) {
        if (fallback == null && node != null) {
          errors.add(doc.lineOf(path, 1), path + "." + key, "missing; add it to [" + path + "]");
        }
        return fallback;
      }
      if (!v.isTextual() || v.asText().isBlank()) {
        error(key, "must be a non-empty text in quotes, got " + written(key));
        return null;
      }
      return v.asText().strip();
    }

    String optionalText(String key) {
      known.add(key);
      return has(key) ? text(key, null) : null;
    }

    String choice(String key, List<String> allowed, String fallback) {
      String t = text(key, fallback);
      if (t == null || allowed.contains(t)) {
        return t;
      }
      String near = Spelling.closest(t, allowed);
      error(key, "unknown value \"" + t + "\"" + (near != null ? "; did you mean \"" + near + "\"?"
          : " (one of: " + String.join(", ", allowed) + ")"));
      return null;
    }

    boolean flag(String key, boolean fallback) {
      JsonNode v = raw(key);
      if (v == null) {
        return fallback;
      }
      if (!v.isBoolean()) {
        error(key, "must be true or false, got " + written(key));
        return fallback;
      }
      return v.asBoolean();
    }

    double number(String key, double fallback) {
      JsonNode v = raw(key);
      if (v == null) {
        return fallback;
      }
      if (!v.isNumber() || !Double.isFinite(v.asDouble())) {
        error(key, "must be a plain finite number without a unit, got " + written(key));
        return Double.NaN;
      }
      return v.asDouble();
    }

    /** A positive duration in seconds; the fallback when absent (NaN fallback: required). */
    double duration(String key, double fallbackS) {
      JsonNode v = raw(key);
      if (v == null) {
        if (Double.isNaN(fallbackS) && node != null) {
          errors.add(doc.lineOf(path, 1), path + "." + key, "missing; add it to [" + path + "]");
        }
        return fallbackS;
      }
      double s = v.isTextual() ? parseDurationS(v.asText()) : Double.NaN;
      if (Double.isNaN(s)) {
        error(key, "must be a duration with its unit such as \"500 ms\", \"1 s\" or \"2 min\", got "
            + written(key));
        return Double.NaN;
      }
      if (!(s > 0.0)) {
        error(key, "must be positive, got " + written(key));
        return Double.NaN;
      }
      return s;
    }

    void finish() {
      if (node == null) {
        return;
      }
      for (Iterator<String> it = node.fieldNames(); it.hasNext(); ) {
        String k = it.next();
        if (!known.contains(k)) {
          String near = Spelling.closest(k, keys);
          error(k, near != null ? "unknown key; did you mean \"" + near + "\"?"
              : "unknown key (expected one of: " + String.join(", ", keys) + ")");
        }
      }
    }
  }
}
