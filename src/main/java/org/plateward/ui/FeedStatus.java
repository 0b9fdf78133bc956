package org.plateward.ui;

/**
 * The always-visible facts about where the data come from, polled by the window a few times a
 * second (cheap, any thread).
 *
 * @param source what the window shows, e.g. "live: opc.tcp://..." or "replay: fuel-surge.csv"
 * @param link connection state in words ("connected", "reconnecting", "replay", ...)
 * @param linkNormal false when the link is in an abnormal state (shown in colour)
 * @param dataAgeS wall seconds since the last new data (NaN: none yet or not applicable)
 * @param clockNote how plant time relates to the wall clock (may be empty)
 * @param historyNote where history and the alarm audit go, in words
 * @param historyNormal false when history is not being kept
 */
public record FeedStatus(String source, String link, boolean linkNormal, double dataAgeS,
    String clockNote, String historyNote, boolean historyNormal) {}
