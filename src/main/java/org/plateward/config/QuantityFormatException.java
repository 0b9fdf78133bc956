package org.plateward.config;

/** A quantity string that is malformed or carries a unit of the wrong dimension. */
public final class QuantityFormatException extends IllegalArgumentException {
  public QuantityFormatException(String message) {
    super(message);
  }
}
