package org.plateward.estimation;

/**
 * Windowed NIS consistency summary. With K updates in the window and d = Σ m_k degrees of
 * freedom, Σ NIS ~ χ²(d) if the filter is consistent (Bar-Shalom, Li &amp; Kirubarajan 2001,
 * §5.4: N·ε̄ ~ χ²(N·n)); the band is its two-sided quantile interval divided by d.
 *
 * @param samples number of updates in the window
 * @param degreesOfFreedom d, the sum of measurement dimensions in the window
 * @param meanNisPerDof Σ NIS / d (1 when consistent)
 * @param lowerPerDof lower band limit χ²_{(1−p)/2}(d)/d
 * @param upperPerDof upper band limit χ²_{(1+p)/2}(d)/d
 * @param windowFull true once the window holds its configured number of updates
 * @param consistent false only when the window is full and the mean lies outside the band
 */
public record NisConsistency(
    int samples,
    int degreesOfFreedom,
    double meanNisPerDof,
    double lowerPerDof,
    double upperPerDof,
    boolean windowFull,
    boolean consistent) {}
