package org.plateward.reactor;

/**
 * Dry composition of the reforming feed gas (before steam is added), mole fractions summing
 * to 1. A little hydrogen is usual (recycle keeps the nickel reduced).
 */
public record FeedGas(double methane, double hydrogen, double carbonDioxide, double nitrogen) {}
