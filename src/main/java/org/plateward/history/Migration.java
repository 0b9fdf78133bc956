package org.plateward.history;

import java.util.List;

/**
 * One step of the schema: the statements that take a history file from {@code version - 1} to
 * {@code version}. Applied in one transaction.
 *
 * @param version the version the file has after this step (1, 2, ...)
 * @param description what the step does, kept in {@code schema_version}
 * @param statements the SQL statements, in order
 */
public record Migration(int version, String description, List<String> statements) {
  public Migration {
    if (version < 1) {
      throw new IllegalArgumentException("migration versions start at 1");
    }
    statements = List.copyOf(statements);
  }
}
