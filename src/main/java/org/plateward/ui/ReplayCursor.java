package org.plateward.ui;

/**
 * Where the replay's cursor stands and how it moves: play at a speed (plant seconds per wall
 * second, or as fast as the estimator goes), pause, scrub to a time, jump to the next alarm.
 * The cursor never passes the feed's head (the last frame estimated); asking for a later time
 * makes the feed estimate up to it. Plain logic, no JavaFX; the window calls {@link #tick} on
 * every pulse.
 */
public final class ReplayCursor {
  /** Speed meaning "as fast as the estimator goes". */
  public static final double MAX = Double.POSITIVE_INFINITY;

  private final ReplayFeed feed;
  private double cursorS = Double.NaN;
  private double wantS = Double.NaN;
  private boolean playing;
  private double speed = 60;
  private boolean awaitingAlarm;
  private String note = "";

  /** @param feed the recording */
  public ReplayCursor(ReplayFeed feed) {
    this.feed = feed;
  }

  public double cursorS() {
    return cursorS;
  }

  public boolean playing() {
    return playing;
  }

  public double speed() {
    return speed;
  }

  /** A line on what the cursor is doing (empty when nothing to say). */
  public String note() {
    return note;
  }

  /** Starts moving at the present speed. */
  public void play() {
    playing = true;
    awaitingAlarm = false;
    note = "";
  }

  public void pause() {
    playing = false;
  }

  public void togglePlay() {
    if (playing) {
      pause();
    } else {
      play();
    }
  }

  /** @param plantSecondsPerWallSecond &gt; 0, or {@link #MAX} */
  public void speed(double plantSecondsPerWallSecond) {
    if (!(plantSecondsPerWallSecond > 0)) {
      throw new IllegalArgumentException("speed must be positive, got " + plantSecondsPerWallSecond);
    }
    speed = plantSecondsPerWallSecond;
  }

  /** Moves the cursor to t (clamped to the recording); a time not yet estimated is estimated first. */
  public void scrubTo(double tS) {
    double t = Math.max(feed.firstS(), Math.min(feed.lastS(), tS));
    awaitingAlarm = false;
    wantS = t;
    feed.runTo(t);
    note = "";
  }

  /** Moves by dt plant seconds (negative: back). */
  public void step(double dtS) {
    double base = Double.isNaN(wantS) ? (Double.isNaN(cursorS) ? feed.firstS() : cursorS) : wantS;
    scrubTo(base + dtS);
  }

  /**
   * Jumps to the next alarm annunciation or clearing after the cursor: at once when already
   * estimated, otherwise once the feed has found it. Pauses there.
   */
  public void nextAlarm(Timeline tl) {
    playing = false;
    var ev = tl.nextEventAfter(Double.isNaN(cursorS) ? Double.NEGATIVE_INFINITY : cursorS);
    if (ev != null) {
      wantS = Timeline.seconds(ev.time());
      note = "at " + ev.alarm().key() + ": " + AlarmsView.stateWords(ev.to());
      return;
    }
    awaitingAlarm = true;
    note = "looking for the next alarm ...";
    feed.runToNextAlarm();
  }

  /** Jumps to the last frame estimated. */
  public void toHead() {
    double h = feed.headS();
    if (!Double.isNaN(h)) {
      wantS = h;
    }
  }

  /**
   * Advances the cursor by one pulse.
   *
   * @param wallDtS wall seconds since the last pulse
   * @param tl the timeline (frames received so far)
   * @return the cursor, epoch s (NaN while nothing has arrived)
   */
  public double tick(double wallDtS, Timeline tl) {
    if (tl.size() == 0) {
      return cursorS;
    }
    double head = tl.timeS(tl.size() - 1);
    if (Double.isNaN(cursorS)) {
      cursorS = tl.timeS(0);
    }
    if (awaitingAlarm) {
      var ev = tl.nextEventAfter(cursorS);
      if (ev != null) {
        awaitingAlarm = false;
        wantS = Timeline.seconds(ev.time());
        note = "at " + ev.alarm().key() + ": " + AlarmsView.stateWords(ev.to());
      } else if (feed.ended() && feed.headS() <= head) {
        awaitingAlarm = false;
        note = "no further alarm in the recording";
      }
    }
    if (playing) {
      double target = speed == MAX ? Double.POSITIVE_INFINITY : cursorS + speed * wallDtS;
      feed.runTo(speed == MAX ? feed.lastS() + 1 : target);
      cursorS = Math.min(target, head);
      wantS = Double.NaN;
      if (feed.ended() && cursorS >= head && feed.headS() <= head) {
        playing = false;
        note = "end of recording";
      }
    } else if (!Double.isNaN(wantS)) {
      cursorS = Math.min(wantS, head);
      if (cursorS >= wantS - 1e-6 || (feed.ended() && feed.headS() <= head)) {
        wantS = Double.NaN;
      }
    }
    return cursorS;
  }
}
