package org.plateward.replay;

import java.util.List;
import java.util.Map;

/**
 * What precedes the rows of a replay file.
 *
 * @param metadata {@code key=value} pairs found in the leading comment lines, in order
 * @param comments the leading comment lines without their '#' and one following space
 * @param columns the header row's column names, in file order
 */
public record ReplayHeader(Map<String, String> metadata, List<String> comments, List<String> columns) {
  public ReplayHeader {
    metadata = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(metadata));
    comments = List.copyOf(comments);
    columns = List.copyOf(columns);
  }
}
