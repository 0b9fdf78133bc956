package org.plateward.report;

/**
 * One line of the key-figures table, in engineering units.
 *
 * @param name figure id (snake case)
 * @param value the value as text (empty when not available)
 * @param unit its unit (empty for words and counts)
 * @param meaning what it is, in words
 */
public record KeyFigure(String name, String value, String unit, String meaning) {}
