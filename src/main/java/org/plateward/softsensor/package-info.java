/**
 * The reactor soft sensor: the plate reactor model inside the generic extended Kalman filter of
 * {@link org.plateward.estimation}, the derived quantities with their uncertainty, the estimator
 * status, and the loop that drives frames from any {@link org.plateward.softsensor.FrameSource}
 * (a replay file now, a live endpoint later). No I/O here.
 *
 * <h2>State vector ({@link org.plateward.softsensor.StateLayout}), n = 79 on the 60-cell grid</h2>
 * <ul>
 *   <li>60 plate enthalpies, scaled as e_j/C (kelvin-equivalent, so the covariance of
 *       temperatures and of the O(1) parameters stays well conditioned, PITFALLS §3.1);</li>
 *   <li>4 random-walk parameters: reforming activity, combustion activity, heat-loss
 *       coefficient, gas-wall heat-transfer multiplier (on the Nusselt number);</li>
 *   <li>2 plate-end thermocouple biases (random walks);</li>
 *   <li>4 first-order sensor lags (reformed gas and flue gas outlet, both plate ends), time
 *       constants from the instrument data (10, 10, 15, 15 s): the sensors read the lag state
 *       (plus the bias for the plate ends), so the frame-rate measurement is linear;</li>
 *   <li>2 × 5 analyzer clones (below).</li>
 * </ul>
 *
 * <h2>Grid</h2>
 * Uniform, 60 cells (10 mm), the configured grid. The hot spot sits near z = 0.48 m where the
 * combustion front meets the end of the reforming washcoat. The grid study of the model
 * (steady peak 1313.5 / 1319.8 / 1320.0 / 1319.8 K at 30 / 60 / 120 / 240 uniform cells) puts 60
 * cells within 0.2 K of the converged peak, while a 30-cell grid is 6.5 K low and smears the hot
 * cell (MODEL.md, "grid smearing"); refining at the coated-zone edges did worse at equal N. The
 * reconstructed peak ({@link org.plateward.reactor.HiddenPeak}) fits a parabola through the
 * hottest cell and its neighbours.
 *
 * <h2>Frames, blocks and timing</h2>
 * Frames arrive at 1 Hz; the filter steps once per 5 s block: inputs are the block means of the
 * usable values (a missing or Bad input holds the last good value and marks the estimate
 * degraded; nothing is invented), the four frame-rate temperatures are block means with R =
 * σ²/k + floor² + q²/12. Block means are centred 2 s before the update time; with sensor lags of
 * 10–15 s and plate time constants of tens of seconds that offset is small. Frames inside a
 * block get the last posterior, with the peak extrapolated by the last propagation's rate (a
 * causal estimate: no frame sees later data).
 *
 * <h2>Jacobian refresh</h2>
 * {@link org.plateward.softsensor.ReactorDynamics} evaluates f every step (one march of each
 * channel) but holds the Jacobian (structured finite differences, about 65 evaluations' worth)
 * and rebuilds it after 60 s, or when a cell moved more than 3 K, a cell entered or left the
 * melting band, an input moved 2 % (5 K), or a parameter moved 2 %. While the Jacobian version
 * stands the filter reuses Φ = (I − hJ)⁻¹ (one LU and n solves per rebuild). On the committed
 * recordings this is one rebuild per 6–8 steps.
 *
 * <h2>Delayed analyzer results: stochastic cloning</h2>
 * The analyzer draws a sample every 30 s and publishes it 60 s later, on that frame only (empty
 * cells in between). The first result fixes the phase of the schedule (it is counted as not
 * placed). From then on, at the block in which a sample is drawn the filter clones the
 * predicted analyzer reading into a free slot: x_c = h(x), P_c· = H P, P_cc = H P Hᵀ + δ
 * (Roumeliotis and Burdick 2002). When the result is published, it updates the clone (H = unit
 * rows), which through the cross-covariance updates the states as they were when the gas was
 * sampled — exact for a linear model (tested against on-time fusion), at the cost of 10 states
 * instead of the rollback's two extra filter steps per frame. A result with no clone (first one,
 * or a schedule slip larger than a block) is dropped and counted.
 *
 * <h2>R (measurement noise) — from the instruments</h2>
 * The instrument figures are those the plant documents (README, sensor table; typical of the
 * instrument classes a site would have on its data sheets): outlet gas thermocouples 1.5 K,
 * plate-end thermocouples 1.0 K, analyzer 0.1 / 0.15 / 0.1 / 0.2 / 0.05 mol% (CH4, CO, CO2,
 * H2, O2), quantisation 0.1 K and 0.01 mol% (q²/12). On top, a representation floor for what the
 * 60-cell model cannot reproduce of a real outlet: 0.5 K on temperatures (a few tenths of a
 * kelvin between 60 and 240 cells in the grid study, plus the mixing of a real outlet header),
 * 0.1 mol% (0.2 for H2, 0.05 for O2) on compositions.
 *
 * <h2>Q (process noise) — from the model's known error sources</h2>
 * <ul>
 *   <li>Input uncertainty mapped through the model: Q_cells = B Σ Bᵀ with B = ∂f/∂u by one
 *       evaluation per input (feed, steam, fuel, air, both inlet temperatures), rebuilt with
 *       each Jacobian. Σ holds the white meter noise (0.5 % of reading, 1 K; σ²·1 s for 1 s
 *       samples) and a slowly wandering systematic meter error (0.5 % of reading, 1 K; the
 *       usual accuracy class) as a Gauss–Markov process of correlation time 300 s, entered by
 *       its low-frequency spectral density 2σ²τ. This is the dominant term: at the demo point
 *       the peak moves about 15 K per 1 % of fuel.</li>
 *   <li>A structural floor of 2e-3 K²/s per cell (a 2.7 K random walk per hour).</li>
 *   <li>Parameters: activities 5 %/h, heat loss 20 %/h, heat-transfer multiplier 1 %/h
 *       (1σ random-walk drift); thermocouple bias 2 K/h. The heat-transfer multiplier starts
 *       at 1.046 ± 0.023: the model's Nu = 7.541 is the uniform-wall-temperature limit, a real
 *       wall lies between it and the uniform-flux 8.235 (Shah and London 1978), so the prior
 *       is the midpoint with ±2σ spanning the two limits.</li>
 * </ul>
 * None of these was fitted to a recording; the one judgement made after looking at results is
 * the systematic meter error (0.5 % rather than 0.25 %), kept at the accuracy class because the
 * smaller value lost coverage inside the fuel surge.
 *
 * <h2>Derived quantities</h2>
 * <ul>
 *   <li>Peak temperature σ: gradient of the parabolic reconstruction with respect to the three
 *       cell temperatures (central differences), times each cell's secant slope dT/dx over ±1σ
 *       (statistical linearisation: on the melting plateau the temperature barely moves with
 *       enthalpy), applied to the 3×3 block of P.</li>
 *   <li>Melt fraction per cell and overall (length-weighted); its σ from the secant slope of φ
 *       over ±1σ of each cell and the full cell covariance (the plain derivative is zero
 *       outside the band). Remaining latent capacity of one plate, J.</li>
 *   <li>Time-to-exhaust ({@link org.plateward.softsensor.ExhaustForecast}): while a cell melts
 *       or the peak is within 25 K of the melting point (the demo unit runs 38 K below it), every 30 s, an open-loop forecast from
 *       the posterior mean with the present inputs and parameters held, over 1800 s; between
 *       forecasts it counts down. Spread: two more forecasts from x ± P e_k/√P_kk, the
 *       conditional shift of the whole state when the critical cell k moves by one σ (a
 *       sigma-point pair along the direction that matters most); σ = half their difference.</li>
 * </ul>
 *
 * <h2>Status ({@link org.plateward.softsensor.EstimatorStatus})</h2>
 * <ul>
 *   <li>degraded: an input held, a frame-rate channel missing, gated or excluded, analyzer
 *       results missing for more than two periods plus the dead time, or the first 10 minutes
 *       after start;</li>
 *   <li>untrustworthy: the windowed NIS outside its 95 % χ² band, or the covariance repaired.</li>
 * </ul>
 * The reason text names each cause.
 *
 * <h2>Sensor drift</h2>
 * Two tests. The plate-end thermocouples have bias states; {@link
 * org.plateward.softsensor.BiasRateMonitor} flags one when its estimated bias moved more than
 * 4σ of a healthy drift over 10 min (3.3 K), and the channel is then excluded for good (its
 * influence removed; a person resets it). A CUSUM alarm of the filter on any frame-rate channel
 * excludes that channel too, but only when it is the only channel alarming (a model error moves
 * several).
 */
package org.plateward.softsensor;
