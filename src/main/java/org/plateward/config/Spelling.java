package org.plateward.config;

import java.util.Collection;

/** Suggestions for misspelt keys. */
final class Spelling {
  private Spelling() {}

  /**
   * Levenshtein edit distance (insertions, deletions and substitutions, each cost 1).
   *
   * <p>Two-row dynamic programme: d[i][j] = min(d[i-1][j] + 1, d[i][j-1] + 1,
   * d[i-1][j-1] + (a[i] != b[j])).
   */
  static int distance(String a, String b) {
    int[] prev = new int[b.length() + 1];
    int[] cur = new int[b.length() + 1];
    for (int j = 0; j <= b.length(); j++) {
      prev[j] = j;
    }
    for (int i = 1; i <= a.length(); i++) {
      cur[0] = i;
      for (int j = 1; j <= b.length(); j++) {
        int sub = prev[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
        cur[j] = Math.min(Math.min(prev[j] + 1, cur[j - 1] + 1), sub);
      }
      int[] t = prev;
      prev = cur;
      cur = t;
    }
    return prev[b.length()];
  }

  /**
   * The candidate closest to {@code word} if it is close enough to be a likely typo (at most
   * a third of the word's length, and at least 1, edits away), else null.
   */
  static String closest(String word, Collection<String> candidates) {
    String best = null;
    int bestD = Integer.MAX_VALUE;
    for (String c : candidates) {
      int d = distance(word.toLowerCase(java.util.Locale.ROOT), c);
      if (d < bestD) {
        bestD = d;
        best = c;
      }
    }
    int allowed = Math.max(1, Math.min(word.length(), best == null ? 0 : best.length()) / 3);
    return bestD <= allowed ? best : null;
  }
}
