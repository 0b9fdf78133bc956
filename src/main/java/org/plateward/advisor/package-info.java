/**
 * The fuel-trim advisor: for fuel-flow trims within configured bounds it forecasts the hidden
 * peak plate temperature (upper bound mean + kσ), the buffer layer's largest cell melt fraction
 * and the reforming methane conversion over a horizon ({@link org.plateward.advisor.TrimForecast}),
 * and suggests the smallest reduction that keeps the peak bound below its limit ({@link
 * org.plateward.advisor.FuelTrimAdvisor}), as an immutable {@link
 * org.plateward.advisor.TrimSuggestion} with a plain-text message. Everything here is advisory;
 * nothing writes to the plant. No I/O in this package.
 */
package org.plateward.advisor;
