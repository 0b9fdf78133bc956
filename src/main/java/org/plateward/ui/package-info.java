/**
 * The control-room window (JavaFX): plate profile, trends, alarms, advisor, replay and
 * estimator health, with the status strip and the advisory caution always in sight.
 *
 * <p>The window computes no physics. A {@link org.plateward.ui.DisplayFeed} — the live monitor
 * ({@link org.plateward.ui.LiveFeed}) or a recording run through the same estimator, alarm
 * board and advisor ({@link org.plateward.ui.ReplayFeed}) — builds one immutable
 * {@link org.plateward.ui.Snapshot} per frame on the estimator's thread and offers it to a
 * lock-free {@link org.plateward.ui.SnapshotMailbox}. One {@code AnimationTimer} on the FX
 * thread takes a bounded batch per pulse into the {@link org.plateward.ui.Timeline} (columns of
 * primitives), moves the {@link org.plateward.ui.ReplayCursor}, and redraws the view on show at
 * most 20 times a second; never one {@code Platform.runLater} per frame. Operator actions go
 * the other way: the view asks the feed, which runs them on the alarm board's own thread, and
 * the board writes the audit trail.
 *
 * <p>Trends and profiles are drawn on canvases: each series is reduced to min/max per pixel
 * column ({@link org.plateward.ui.MinMaxDecimator}), then stroked as one polyline (sparse) or
 * filled as one envelope polygon (dense) per run. Colours follow ANSI/ISA-101.01 practice: grey
 * background, colour only for abnormal states, priority as shape and word as well
 * ({@link org.plateward.ui.Palette}).
 *
 * <p>{@link org.plateward.ui.WindowLauncher} names no JavaFX type, so {@code --headless} runs
 * never load the toolkit.
 */
package org.plateward.ui;
