package org.plateward.config;

import com.fasterxml.jackson.core.JacksonException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.dataformat.toml.TomlMapper;
import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;

/** A parsed TOML configuration file: its tree and the line of every key in it. */
final class TomlDocument {
  private static final TomlMapper MAPPER = new TomlMapper();

  private final Path file;
  private final JsonNode root;
  private final TomlKeyLines lines;
  private final int lineCount;

  private TomlDocument(Path file, JsonNode root, TomlKeyLines lines, int lineCount) {
    this.file = file;
    this.root = root;
    this.lines = lines;
    this.lineCount = lineCount;
  }

  /**
   * Reads and parses a file (UTF-8). Nothing is written.
   *
   * @throws InvalidConfigException when the file cannot be read or is not valid TOML; the
   *     error carries the parser's line
   */
  static TomlDocument read(Path file) throws InvalidConfigException {
    String text;
    try {
      text = Files.readString(file, StandardCharsets.UTF_8);
    } catch (NoSuchFileException e) {
      throw single(file, 0, null, "no such file");
    } catch (CharacterCodingException e) {
      throw single(file, 0, null, "not UTF-8 text");
    } catch (IOException e) {
      throw single(file, 0, null, "cannot read: " + e.getMessage());
    }
    return parse(file, text);
  }

  /** Parses text that came from {@code file}. */
  static TomlDocument parse(Path file, String text) throws InvalidConfigException {
    int lineCount = (int) text.lines().count();
    JsonNode root;
    try {
      root = MAPPER.readTree(text);
    } catch (JacksonException e) {
      int l = e.getLocation() == null ? 1 : e.getLocation().getLineNr();
      // the lexer may stand on the line after the offending newline; keep the line inside the file
      l = Math.max(1, Math.min(l, Math.max(1, lineCount)));
      throw single(file, l, "TOML syntax", e.getOriginalMessage());
    }
    if (root == null || !root.isObject()) {
      throw single(file, 1, null, "empty configuration");
    }
    return new TomlDocument(file, root, TomlKeyLines.scan(text), lineCount);
  }

  private static InvalidConfigException single(Path file, int line, String field, String msg) {
    return new InvalidConfigException(List.of(new ConfigError(file, line, field, msg)));
  }

  Path file() {
    return file;
  }

  JsonNode root() {
    return root;
  }

  /** The line where a dotted path starts, or {@code fallback} when it does not occur. */
  int lineOf(String path, int fallback) {
    int l = lines.lineOf(path);
    return l > 0 ? l : fallback;
  }

  int lineCount() {
    return lineCount;
  }
}
