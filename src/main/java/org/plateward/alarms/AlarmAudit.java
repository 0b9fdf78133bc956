package org.plateward.alarms;

/** Where every alarm transition and every accepted operator action goes (append-only). */
public interface AlarmAudit {
  /** Records one lifecycle transition. */
  void event(AlarmEvent e);

  /** Records one accepted operator action. */
  void action(OperatorAction a);

  /** An audit that keeps nothing (tests, dry runs). */
  AlarmAudit NONE = new AlarmAudit() {
    @Override
    public void event(AlarmEvent e) {}

    @Override
    public void action(OperatorAction a) {}
  };
}
