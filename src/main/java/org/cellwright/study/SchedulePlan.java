package org.cellwright.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import org.cellwright.cell.Scenario;
import org.cellwright.cell.SetPoint;
import org.cellwright.sim.RunResult;
import org.cellwright.sim.TracePoint;

/**
 * A current schedule that deposits a mass of the target metal in the least time found while the target's
 * partial current stays at or below a fraction of its limiting current, checked by running it.
 *
 * @param metal the target metal
 * @param massKg the deposit goal (kg)
 * @param maxFraction the highest allowed share of the limiting current
 * @param steps the set currents, a handful of steps (A, from their times in s)
 * @param durationS time to reach the goal with the steps (s), from the verifying run
 * @param scenario the user's scenario with the schedule filled in, the goal as a deposit stop and a duration
 *     just beyond the goal: the file to write
 * @param verification the run of {@code scenario}
 * @param maxRatio the highest share of the limiting current in {@code verification}
 * @param constantCurrentA the highest constant current that keeps the share at or below the fraction until
 *     the goal (A)
 * @param constantCurrentS time to the goal at that current (s)
 * @param adaptiveS time to the goal when the current follows the falling limit in many small steps (s): how
 *     close the handful of steps comes to the adaptive ideal
 * @param notes plain-words remarks (supply at its voltage limit, a non-depleting bath, a lowered fraction)
 * @param runs engine runs the planning took
 */
public record SchedulePlan(String metal, double massKg, double maxFraction, List<SetPoint> steps, double durationS,
                           Scenario scenario, RunResult verification, double maxRatio, double constantCurrentA,
                           double constantCurrentS, double adaptiveS, List<String> notes, int runs) {

    public SchedulePlan {
        Objects.requireNonNull(metal, "metal");
        steps = List.copyOf(steps);
        notes = List.copyOf(notes);
    }

    /**
     * One step of the plan as run.
     *
     * @param startS when it starts (s)
     * @param endS when it ends: the next step, or the goal (s)
     * @param currentA its set current (A)
     * @param ratioAtEnd the target's share of its limiting current at its end, from the verifying run
     * @param depositKgAtEnd the target's deposit at its end (kg)
     */
    public record Step(double startS, double endS, double currentA, double ratioAtEnd, double depositKgAtEnd) {
    }

    /** @return the steps with their ends, share of the limiting current and deposit, from the verifying run */
    public List<Step> table() {
        List<Step> out = new ArrayList<>();
        int metalIndex = verification.metalSymbols().indexOf(metal);
        List<TracePoint> trace = verification.trace();
        for (int k = 0; k < steps.size(); k++) {
            double start = steps.get(k).atS();
            double end = k + 1 < steps.size() ? steps.get(k + 1).atS() : durationS;
            double ratio = 0;
            double deposit = 0;
            for (TracePoint p : trace) {
                if (p.timeS() <= end + 1e-9) {
                    ratio = p.state().targetLimitRatio();
                    deposit = metalIndex < 0 ? 0 : p.depositKg()[metalIndex];
                }
            }
            out.add(new Step(start, end, steps.get(k).value(), ratio, deposit));
        }
        return out;
    }

    /** @return the time the plan saves against the constant current (s) */
    public double savedS() {
        return constantCurrentS - durationS;
    }
}
