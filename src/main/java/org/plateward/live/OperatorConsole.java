package org.plateward.live;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.Reader;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.plateward.alarms.ActionKind;
import org.plateward.alarms.ActionResult;
import org.plateward.alarms.AlarmKind;
import org.plateward.alarms.AlarmState;
import org.plateward.alarms.AlarmStatus;
import org.plateward.config.Dimension;
import org.plateward.config.Quantity;
import org.plateward.config.QuantityFormatException;
import org.plateward.config.Spelling;

/**
 * Operator commands typed on the console of {@code watch} and {@code demo}, one per line, read
 * on a daemon thread and applied through the alarm board (so each accepted action goes to the
 * audit trail with the operator's name):
 *
 * <pre>
 *   ack ALARM [comment...]                acknowledge
 *   shelve ALARM DURATION REASON...       shelve, e.g. shelve melt_high 30min probe being replaced
 *   unshelve ALARM [comment...]           unshelve before the expiry
 *   alarms                                list every alarm and its state
 *   help                                  this list
 * </pre>
 *
 * Durations are written with their unit, as in the configuration ("30min", "2h", "90 s").
 * Every reply starts with "&gt;&gt; " so it stands apart from the status blocks. Advisory only.
 */
public final class OperatorConsole implements AutoCloseable {
  static final String HELP = String.join("\n",
      ">> operator commands (advisory alarms; every action is stored with your name):",
      ">>   ack ALARM [comment...]            acknowledge an alarm",
      ">>   shelve ALARM DURATION REASON...   shelve it, e.g. shelve melt_high 30min probe being replaced",
      ">>   unshelve ALARM [comment...]       unshelve it before its expiry",
      ">>   alarms                            list the alarms and their states",
      ">>   help                              this list");

  private final AlarmActions target;
  private final String who;
  private final PrintWriter out;
  private Thread reader;

  /**
   * @param target the board's owner
   * @param who the operator name stored with every action
   * @param out where replies go
   */
  public OperatorConsole(AlarmActions target, String who, PrintWriter out) {
    if (who == null || who.isBlank()) {
      throw new IllegalArgumentException("the operator needs a name");
    }
    this.target = target;
    this.who = who.strip();
    this.out = out;
  }

  /** The operator name of this console: {@code --operator} if given, else the OS user. */
  public static String operatorName(String given) {
    if (given != null && !given.isBlank()) {
      return given.strip();
    }
    String user = System.getProperty("user.name");
    return user == null || user.isBlank() ? "operator" : user;
  }

  /** Starts reading commands from {@code in} on a daemon thread; ends at end of input. */
  public OperatorConsole start(Reader in) {
    reader = new Thread(() -> readAll(in), "plateward-operator-console");
    reader.setDaemon(true);
    reader.start();
    return this;
  }

  /** Reads and handles every line of {@code in} on the calling thread, until end of input. */
  public void readAll(Reader in) {
    try (BufferedReader r = new BufferedReader(in)) {
      String line;
      while ((line = r.readLine()) != null) {
        String reply = handle(line);
        if (!reply.isEmpty()) {
          synchronized (out) {
            out.println(reply);
            out.flush();
          }
        }
      }
    } catch (IOException e) {
      synchronized (out) {
        out.println(">> console input closed: " + e.getMessage());
        out.flush();
      }
    }
  }

  /** Waits up to {@code millis} for the reader thread to reach the end of its input. */
  public void join(long millis) throws InterruptedException {
    if (reader != null) {
      reader.join(millis);
    }
  }

  /**
   * Handles one command line.
   *
   * @return the reply (empty for a blank line)
   */
  public String handle(String line) {
    String[] w = line.strip().split("\\s+");
    if (w.length == 0 || w[0].isEmpty()) {
      return "";
    }
    String cmd = w[0].toLowerCase(Locale.ROOT);
    return switch (cmd) {
      case "help", "?" -> HELP;
      case "alarms" -> list();
      case "ack" -> simple(ActionKind.ACKNOWLEDGE, w);
      case "unshelve" -> simple(ActionKind.UNSHELVE, w);
      case "shelve" -> shelve(w);
      default -> {
        String near = Spelling.closest(cmd, List.of("ack", "shelve", "unshelve", "alarms", "help"));
        yield ">> unknown command \"" + w[0] + "\"" + (near != null ? "; did you mean \"" + near + "\"?" : "")
            + " (type help for the list)";
      }
    };
  }

  private String simple(ActionKind kind, String[] w) {
    String word = w[0].toLowerCase(Locale.ROOT);
    if (w.length < 2) {
      return ">> " + word + ": name the alarm: " + word + " ALARM [comment...] (alarms: " + alarmKeys() + ")";
    }
    AlarmKind alarm = AlarmKind.ofKey(w[1]);
    if (alarm == null) {
      return unknownAlarm(word, w[1]);
    }
    String comment = rest(w, 2);
    return reply(target.act(kind, who, alarm, comment, null));
  }

  private String shelve(String[] w) {
    String usage = " (shelve ALARM DURATION REASON..., e.g. shelve melt_high 30min probe being replaced)";
    if (w.length < 2) {
      return ">> shelve: name the alarm" + usage;
    }
    AlarmKind alarm = AlarmKind.ofKey(w[1]);
    if (alarm == null) {
      return unknownAlarm("shelve", w[1]);
    }
    if (w.length < 3) {
      return ">> shelve " + alarm.key() + ": needs an expiry: say for how long" + usage;
    }
    int next = 3;
    String text = w[2];
    // "30 min" written with a space: take the unit from the next word
    if (w.length > 3 && w[2].matches("[+-]?[0-9.]+([eE][+-]?[0-9]+)?") && isTimeUnit(w[3])) {
      text = w[2] + " " + w[3];
      next = 4;
    }
    double s;
    try {
      s = Quantity.parse(text, Dimension.TIME).valueSi();
    } catch (QuantityFormatException e) {
      return ">> shelve " + alarm.key() + ": bad duration \"" + text + "\": " + e.getMessage() + usage;
    }
    if (!(s > 0.0)) {
      return ">> shelve " + alarm.key() + ": the duration must be positive, got \"" + text + "\"" + usage;
    }
    String reason = rest(w, next);
    if (reason == null) {
      return ">> shelve " + alarm.key() + ": needs a reason" + usage;
    }
    return reply(target.act(ActionKind.SHELVE, who, alarm, reason, Duration.ofMillis(Math.round(s * 1000))));
  }

  private static boolean isTimeUnit(String word) {
    for (Dimension.UnitOfMeasure u : Dimension.TIME.units()) {
      if (u.symbol().equalsIgnoreCase(word)) {
        return true;
      }
    }
    return false;
  }

  private String list() {
    List<AlarmStatus> st = target.statuses();
    if (st.isEmpty()) {
      return ">> no alarms are being judged yet";
    }
    StringBuilder b = new StringBuilder(">> alarms (advisory):");
    for (AlarmStatus a : st) {
      b.append(String.format(Locale.ROOT, "%n>>   %-24s %-9s %s", a.kind().key(), a.priority().key(),
          a.state().word()));
      if (a.state() == AlarmState.SHELVED && a.shelvedUntil() != null) {
        b.append(" until ").append(a.shelvedUntil()).append(" by ").append(a.shelvedBy())
            .append(a.reason() == null ? "" : " (" + a.reason() + ")");
      }
    }
    return b.toString();
  }

  private static String reply(ActionResult r) {
    return (r.accepted() ? ">> done: " : ">> refused: ") + r.message();
  }

  private static String unknownAlarm(String word, String given) {
    List<String> keys = keys();
    String near = Spelling.closest(given, keys);
    return ">> " + word + ": unknown alarm \"" + given + "\"" + (near != null ? "; did you mean \"" + near + "\"?" : "")
        + " (alarms: " + String.join(", ", keys) + ")";
  }

  private static List<String> keys() {
    List<String> k = new ArrayList<>();
    for (AlarmKind a : AlarmKind.values()) {
      k.add(a.key());
    }
    return k;
  }

  private static String alarmKeys() {
    return String.join(", ", keys());
  }

  private static String rest(String[] w, int from) {
    if (w.length <= from) {
      return null;
    }
    return String.join(" ", Arrays.copyOfRange(w, from, w.length));
  }

  /** Stops nothing: the reader is a daemon thread blocked on the input and ends with the JVM. */
  @Override
  public void close() {
    // a blocked read on stdin cannot be interrupted portably; the daemon thread dies with the JVM
  }
}
