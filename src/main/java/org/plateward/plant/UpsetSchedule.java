package org.plateward.plant;

import java.util.ArrayList;
import java.util.List;
import org.plateward.reactor.ModelParameters;
import org.plateward.reactor.OperatingPoint;
import org.plateward.reactor.UnitSpec;
import org.plateward.signals.Signal;

/**
 * The true inputs and true parameters of the plant at any time: the unit's operating point and
 * nominal parameters changed by the scenario's upsets, each shaped by its ramp.
 *
 * <pre>
 *   feed (gas and steam)  F(t) = F0 prod_i (1 - m_i s_i(t))             feed_drop
 *   fuel                  F(t) = F0 prod_i (1 + m_i s_i(t))             fuel_surge
 *   steam                 S(t) = F_CH4(t) [SC0 + (SC_i - SC0) s_i(t)]   steam_to_carbon
 *   inlet temperature     T(t) = T0 + sum_i dT_i s_i(t)                 inlet_temp_step
 *   activity              a(t) = a0 exp(-t / tau_bg) prod_i g_i(t),
 *                         g_i = 1 - m_i (1 - exp(-(t - t_i) / tau_i)) for t > t_i   catalyst_ageing
 * </pre>
 *
 * s_i(t) is the event's ramped strength ({@link ScenarioEvent#strength}); SC0 is the unit's own
 * steam-to-carbon ratio (steam over feed methane).
 */
public final class UpsetSchedule {
  private final UnitSpec unit;
  private final TruthSettings truth;
  private final List<ScenarioEvent> feed = new ArrayList<>();
  private final List<ScenarioEvent> fuel = new ArrayList<>();
  private final List<ScenarioEvent> steamToCarbon = new ArrayList<>();
  private final List<ScenarioEvent> refInlet = new ArrayList<>();
  private final List<ScenarioEvent> combInlet = new ArrayList<>();
  private final List<ScenarioEvent> refAgeing = new ArrayList<>();
  private final List<ScenarioEvent> combAgeing = new ArrayList<>();
  private final double baseSteamToCarbon;

  public UpsetSchedule(UnitSpec unit, TruthSettings truth, List<ScenarioEvent> events) {
    this.unit = unit;
    this.truth = truth;
    for (ScenarioEvent ev : events) {
      switch (ev.kind()) {
        case FEED_DROP -> feed.add(ev);
        case FUEL_SURGE -> fuel.add(ev);
        case STEAM_TO_CARBON -> steamToCarbon.add(ev);
        case INLET_TEMP_STEP -> {
          if (ev.targets().contains(Signal.COMB_INLET_TEMP)) {
            combInlet.add(ev);
          } else {
            refInlet.add(ev);
          }
        }
        case CATALYST_AGEING -> {
          if ("combustion".equals(ev.catalyst())) {
            combAgeing.add(ev);
          } else {
            refAgeing.add(ev);
          }
        }
        default -> { } // sensor faults act on the readings, not on the process
      }
    }
    OperatingPoint u0 = unit.operatingPoint();
    this.baseSteamToCarbon = u0.steamFlowMolPerS() / (u0.reformingGasFlowMolPerS() * unit.feedGas().methane());
  }

  /** Steam-to-carbon ratio of the configured operating point (steam over feed methane, mol/mol). */
  public double baseSteamToCarbon() {
    return baseSteamToCarbon;
  }

  /** The true inputs at time t (s from the first frame). */
  public OperatingPoint inputsAt(double tS) {
    OperatingPoint u0 = unit.operatingPoint();
    double feedFactor = 1.0;
    for (ScenarioEvent ev : feed) {
      feedFactor *= 1.0 - ev.magnitude() * ev.strength(tS);
    }
    double fuelFactor = 1.0;
    for (ScenarioEvent ev : fuel) {
      fuelFactor *= 1.0 + ev.magnitude() * ev.strength(tS);
    }
    double gas = u0.reformingGasFlowMolPerS() * feedFactor;
    double sc = baseSteamToCarbon;
    for (ScenarioEvent ev : steamToCarbon) {
      sc += (ev.magnitude() - baseSteamToCarbon) * ev.strength(tS);
    }
    double steam = gas * unit.feedGas().methane() * sc;
    double refIn = u0.reformingInletTempK();
    for (ScenarioEvent ev : refInlet) {
      refIn += ev.magnitude() * ev.strength(tS);
    }
    double combIn = u0.combustionInletTempK();
    for (ScenarioEvent ev : combInlet) {
      combIn += ev.magnitude() * ev.strength(tS);
    }
    return new OperatingPoint(
        gas, steam, refIn, u0.reformingPressurePa(),
        u0.fuelFlowMolPerS() * fuelFactor, u0.airFlowMolPerS(), combIn, u0.combustionPressurePa());
  }

  /** The true parameters at time t: activities with deactivation, the plant's heat loss. */
  public ModelParameters parametersAt(double tS) {
    ModelParameters p0 = ModelParameters.nominal(unit);
    double ref = p0.reformingActivity() * Math.exp(-tS / truth.reformingDeactivationTimeS()) * ageing(refAgeing, tS);
    double comb = p0.combustionActivity() * ageing(combAgeing, tS);
    return new ModelParameters(ref, comb, truth.heatLossWPerM2K(), p0.heatTransferMultiplier());
  }

  private static double ageing(List<ScenarioEvent> events, double tS) {
    double g = 1.0;
    for (ScenarioEvent ev : events) {
      if (tS > ev.atS()) {
        g *= 1.0 - ev.magnitude() * (1.0 - Math.exp(-(tS - ev.atS()) / ev.timeConstantS()));
      }
    }
    return g;
  }
}
