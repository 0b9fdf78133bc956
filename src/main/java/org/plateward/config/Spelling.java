package org.plateward.config;

import java.util.Collection;
import java.util.Locale;

/** Suggestions for misspelt keys, table names, column names and status names. */
public final class Spelling {
  private Spelling() {}

  /**
   * Optimal-string-alignment edit distance: insertions, deletions, substitutions and swaps of
   * two neighbouring characters, each cost 1 (a swap is the commonest typo: "widht").
   *
   * <p>d[i][j] = min(d[i-1][j] + 1, d[i][j-1] + 1, d[i-1][j-1] + (a[i] != b[j]),
   * d[i-2][j-2] + 1 if a[i] = b[j-1] and a[i-1] = b[j]).
   */
  static int distance(String a, String b) {
    int[][] d = new int[a.length() + 1][b.length() + 1];
    for (int i = 0; i <= a.length(); i++) {
      d[i][0] = i;
    }
    for (int j = 0; j <= b.length(); j++) {
      d[0][j] = j;
    }
    for (int i = 1; i <= a.length(); i++) {
      for (int j = 1; j <= b.length(); j++) {
        int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
        int v = Math.min(Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1), d[i - 1][j - 1] + cost);
        if (i > 1 && j > 1 && a.charAt(i - 1) == b.charAt(j - 2) && a.charAt(i - 2) == b.charAt(j - 1)) {
          v = Math.min(v, d[i - 2][j - 2] + 1);
        }
        d[i][j] = v;
      }
    }
    return d[a.length()][b.length()];
  }

  /**
   * The candidate closest to {@code word} if it is close enough to be a likely typo (at most
   * one edit per three characters of the shorter word, and at least one), else null.
   */
  public static String closest(String word, Collection<String> candidates) {
    String w = word.toLowerCase(Locale.ROOT);
    String best = null;
    int bestD = Integer.MAX_VALUE;
    for (String c : candidates) {
      int d = distance(w, c.toLowerCase(Locale.ROOT));
      if (d < bestD) {
        bestD = d;
        best = c;
      }
    }
    if (best == null || best.equals(word)) {
      return null;
    }
    int allowed = Math.max(1, Math.min(w.length(), best.length()) / 3);
    return bestD <= allowed ? best : null;
  }
}
