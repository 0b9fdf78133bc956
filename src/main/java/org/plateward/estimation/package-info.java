/**
 * The generic estimation core: a continuous-discrete extended Kalman filter that knows nothing
 * about the reactor. The reactor model plugs in through two small interfaces.
 *
 * <h2>Model interfaces</h2>
 * {@link org.plateward.estimation.Dynamics} gives dx/dt = f(x,u) and J = ∂f/∂x, and
 * {@link org.plateward.estimation.MeasurementModel} gives y = h(x,u) and H = ∂h/∂x. Each has a
 * combined {@code evaluate} so a model that gets f and J (or h and H) from one pass does not pay
 * twice. Augmented random-walk parameters (catalyst activity, heat loss) are ordinary states
 * with zero rows in f and J and their own entries in Q. Several measurement models can be used
 * with one filter (frame-rate sensors, the analyzer); each keeps its own CUSUM.
 *
 * <h2>Propagation</h2>
 * This is the linearly implicit (Rosenbrock–Euler) step. It reuses the Jacobian at the start of
 * each sub-step:
 * <pre>  A = I − hJ (LU, partial pivoting),  x ← x + A⁻¹ h f(x),  P ← A⁻¹ (P + h λ Q) A⁻ᵀ</pre>
 * The covariance part is the implicit-Euler discretisation of Ṗ = JP + PJᵀ + Q, so
 * Q_d = h Φ Q Φᵀ with Φ = A⁻¹. It is first order. Halving h halves the error against Van Loan's
 * exact discretisation (see the tests). Φ is never formed: the covariance step is two
 * multi-right-hand-side LU solves, and zero entries of the factors are skipped (this pays off
 * for banded Jacobians). The step is L-stable, so a stiff thermal model is safe at h = 1 s.
 * Sub-steps are equal and no longer than {@link org.plateward.estimation.FilterSettings#maxSubstepS()}.
 *
 * <p>A model that holds its Jacobian over several steps says so through {@link
 * org.plateward.estimation.Dynamics#jacobianVersion()}. While the version and the step length
 * stand, Φ = A⁻¹ is formed once (LU and n solves) and each step is x ← x + Φ h f,
 * P ← Φ (P + h λ Q) Φᵀ as two products that skip Φ's zero entries; the same arithmetic as the
 * LU path (tested to 1e-12). {@code setProcessNoiseDensity} replaces Q between propagations.
 * For cross-checks, {@code propagateLinear} is a plain discrete mode: x ← Φx + c,
 * P ← ΦPΦᵀ + Q_d.
 *
 * <h2>Update</h2>
 * <ul>
 *   <li>Each update takes a per-channel availability mask. NaN also counts as unavailable.
 *       Missing, Bad or stale values are skipped, never filled, and P grows through propagation
 *       alone.</li>
 *   <li>Gating is done per channel (ν²/S_ii against χ²₁) and then jointly (NIS against χ²_m).
 *       When the joint gate fails, the channel with the largest ν²/S_ii is removed and the test
 *       is repeated.</li>
 *   <li>The gain comes from a hand-written Cholesky solve of the small S (Kᵀ = S⁻¹HP). Nothing
 *       is inverted explicitly.</li>
 *   <li>The covariance uses the Joseph form (I − KH)P(I − KH)ᵀ + KRKᵀ, evaluated as
 *       W = P − K(HP), P = W − (WHᵀ − KR)Kᵀ. This is the same product at O(n²m) cost.</li>
 *   <li>P is symmetrised after every propagation and update. It is checked by its diagonal after
 *       a propagation, and by a Cholesky factorisation after an update (switchable). When the
 *       check fails, P is repaired by an eigenvalue floor (1e-9 × the largest eigenvalue by
 *       default), and the next {@link org.plateward.estimation.StepResult} reports it.</li>
 * </ul>
 * The Joseph form helps down to δ ≈ 1e-6 in the ill-conditioned test example. For δ ≤ 1e-8 it
 * also needs the repair; a square-root filter would be the next step if the reactor ever gets
 * there.
 *
 * <h2>Delayed measurements: exact rollback</h2>
 * The filter keeps a bounded ring of epochs (time, prior x and P, the updates applied there and
 * the propagation to the next epoch). A delayed value is handled in four steps:
 * <ol>
 *   <li>It is inserted at its own time. If that time falls between two epochs, the propagation
 *       between them is split there.</li>
 *   <li>The filter restores the prior of the epoch at or before that time.</li>
 *   <li>It re-applies that epoch's updates and the new one.</li>
 *   <li>It re-runs every later propagation and update.</li>
 * </ol>
 * For a linear model the result is bit-identical to a filter that had the value on time. For a
 * nonlinear model it is the exact EKF re-run, with the Jacobians re-evaluated.
 *
 * Only the delayed update feeds the NIS window, the CUSUM and the adaptive Q; re-applied updates
 * were counted when they first arrived. The adaptive-Q factor of each stored propagation is
 * replayed as it was.
 *
 * The cost is one filter step per epoch rolled back. An analyzer with a 60 s dead time every
 * 30 s at 1 Hz adds about two steps per frame. Values older than the history are dropped and
 * counted.
 *
 * <h2>Delayed measurements: stochastic cloning</h2>
 * The cheaper alternative to rollback ({@code captureClone}): when a delayed sample is drawn,
 * the predicted measurement is copied into held states with its exact covariance
 * (x_c = h(x), P_c· = H P, P_cc = H P Hᵀ + δ; Roumeliotis &amp; Burdick 2002); the value fused
 * into them later lands at its own time, exactly for a linear model (tested against on-time
 * fusion), for m extra states instead of re-running the filter.
 *
 * <h2>Health</h2>
 * <ul>
 *   <li>{@link org.plateward.estimation.NisWindow}: the windowed NIS against its two-sided
 *       χ²(Σm) band (Bar-Shalom, Li &amp; Kirubarajan 2001, §5.4). Its output is the consistency
 *       flag.</li>
 *   <li>{@link org.plateward.estimation.InnovationCusum}: a two-sided, winsorised CUSUM on
 *       ν/√S_ii per channel. It reports the channel, its direction and an estimate of when the
 *       drift started.</li>
 *   <li>{@link org.plateward.estimation.ProcessNoiseAdapter}: innovation-based scalar inflation
 *       of Q, bounded and switchable (covariance matching after Mehra 1970 and Mohamed &amp;
 *       Schwarz 1999).</li>
 *   <li>Observability: every result carries the per-state variance reduction 1 − P⁺ᵢᵢ/P⁻ᵢᵢ.
 *       That is how much the present measurement set pins each state down. A state that stays
 *       at 0 is not seen by the present measurements.</li>
 * </ul>
 *
 * <p>All quantities are SI, in the model's own state units. Nothing here does I/O.
 */
package org.plateward.estimation;
