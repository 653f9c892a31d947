package org.cellwright.io;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.cellwright.cell.ControlMode;
import org.cellwright.cell.PowerSupply;
import org.cellwright.cell.SetPoint;

/**
 * Reads {@code [supply]}: exactly one of current, current_density (times the cathode area), voltage or
 * schedule; optional voltage_limit and current_limit (default: none). A schedule is an array of points
 * {@code {at = "0 h", current = "3 A"}} (or current_density, or voltage for voltage control; ramp = true to
 * ramp from the previous point) with times that do not decrease.
 */
final class SupplyReader {

    static final Set<String> KEYS = Set.of("current", "current_density", "voltage", "voltage_limit",
            "current_limit", "schedule");
    static final List<String> SET_VALUES = List.of("current", "current_density", "voltage", "schedule");
    static final Set<String> POINT_KEYS = Set.of("at", "current", "current_density", "voltage", "ramp");

    /**
     * @param cathodeAreaM2 the cathode area (m2), NaN when it could not be read
     * @return the supply, or empty when missing or wrong (reported)
     */
    Optional<PowerSupply> read(SectionReader root, double cathodeAreaM2) {
        Optional<SectionReader> section = root.table("supply");
        if (section.isEmpty()) {
            if (!root.has("supply")) {
                root.missing("supply.current", "\"3 A\" (or current_density, voltage or schedule)");
            }
            return Optional.empty();
        }
        SectionReader s = section.get();
        s.allowOnly(KEYS);
        List<String> given = SET_VALUES.stream().filter(s::has).toList();
        if (given.isEmpty()) {
            s.missing("current", "\"3 A\" (or current_density, voltage or schedule)");
            return Optional.empty();
        }
        if (given.size() > 1) {
            String second = given.get(1);
            s.log().error(s.at(second), s.key(second), "give only one of current, current_density, voltage or "
                    + "schedule; " + given.get(0) + " is given on line " + s.at(given.get(0)).line());
            return Optional.empty();
        }
        double limitV = s.has("voltage_limit")
                ? s.quantity("voltage_limit", Dimension.VOLTAGE, Range.POSITIVE).orElse(Double.NaN)
                : Double.POSITIVE_INFINITY;
        double limitA = s.has("current_limit")
                ? s.quantity("current_limit", Dimension.CURRENT, Range.POSITIVE).orElse(Double.NaN)
                : Double.POSITIVE_INFINITY;
        String how = given.get(0);
        ControlMode mode;
        double setA = 0;
        double setV = 0;
        List<SetPoint> schedule = List.of();
        switch (how) {
            case "current" -> {
                mode = ControlMode.CURRENT;
                setA = s.quantity("current", Dimension.CURRENT, Range.POSITIVE).orElse(Double.NaN);
            }
            case "current_density" -> {
                mode = ControlMode.CURRENT;
                setA = s.quantity("current_density", Dimension.CURRENT_DENSITY, Range.POSITIVE).orElse(Double.NaN)
                        * cathodeAreaM2;
            }
            case "voltage" -> {
                mode = ControlMode.VOLTAGE;
                setV = s.quantity("voltage", Dimension.VOLTAGE, Range.POSITIVE).orElse(Double.NaN);
            }
            default -> {
                Optional<Schedule> read = schedule(s, cathodeAreaM2);
                if (read.isEmpty()) {
                    return Optional.empty();
                }
                mode = read.get().mode();
                schedule = read.get().points();
                setA = mode == ControlMode.CURRENT ? schedule.get(0).value() : 0;
                setV = mode == ControlMode.VOLTAGE ? schedule.get(0).value() : 0;
            }
        }
        if (Double.isNaN(setA) || Double.isNaN(setV) || Double.isNaN(limitV) || Double.isNaN(limitA)) {
            return Optional.empty();
        }
        if (mode == ControlMode.CURRENT && s.has("current_limit")) {
            s.log().warning(s.at("current_limit"), s.key("current_limit"),
                    "has no effect in current control; the supply holds the set current");
        }
        if (mode == ControlMode.VOLTAGE && s.has("voltage_limit")) {
            s.log().warning(s.at("voltage_limit"), s.key("voltage_limit"),
                    "has no effect in voltage control; the supply holds the set voltage");
        }
        return Optional.of(new PowerSupply(mode, setA, setV, limitV, limitA, schedule));
    }

    private record Schedule(ControlMode mode, List<SetPoint> points) {
    }

    private Optional<Schedule> schedule(SectionReader s, double cathodeAreaM2) {
        Optional<TomlNode.Array> array = s.array("schedule");
        if (array.isEmpty()) {
            return Optional.empty();
        }
        List<TomlNode> items = array.get().items();
        if (items.isEmpty()) {
            s.log().error(s.at("schedule"), s.key("schedule"), "the schedule is empty; give at least one point, "
                    + "e.g. [ { at = \"0 h\", current = \"3 A\" } ]");
            return Optional.empty();
        }
        List<SetPoint> points = new ArrayList<>();
        ControlMode mode = null;
        boolean ok = true;
        double lastAt = Double.NEGATIVE_INFINITY;
        String lastAtText = "";
        for (int i = 0; i < items.size(); i++) {
            String key = s.key("schedule") + "[" + (i + 1) + "]";
            if (!(items.get(i) instanceof TomlNode.Table t)) {
                s.log().error(items.get(i).at(), key, "expected a point { at = \"0 h\", current = \"3 A\" }, got "
                        + items.get(i).kind());
                ok = false;
                continue;
            }
            SectionReader p = new SectionReader(t, key, s.log());
            p.allowOnly(POINT_KEYS);
            List<String> values = List.of("current", "current_density", "voltage").stream().filter(p::has).toList();
            if (!p.has("at")) {
                p.missing("at", "\"0 h\"");
            }
            if (values.size() != 1) {
                s.log().error(t.at(), key, values.isEmpty()
                        ? "a schedule point needs current, current_density or voltage"
                        : "a schedule point takes only one of current, current_density or voltage");
                ok = false;
                continue;
            }
            String how = values.get(0);
            ControlMode pointMode = how.equals("voltage") ? ControlMode.VOLTAGE : ControlMode.CURRENT;
            if (mode != null && pointMode != mode) {
                p.log().error(p.at(how), p.key(how), "all points of a schedule must set the same thing: the first "
                        + "sets a " + (mode == ControlMode.CURRENT ? "current" : "voltage"));
                ok = false;
                continue;
            }
            mode = pointMode;
            Optional<Double> at = p.quantity("at", Dimension.TIME, Range.NON_NEGATIVE);
            Optional<Double> value = switch (how) {
                case "current" -> p.quantity(how, Dimension.CURRENT, Range.NON_NEGATIVE);
                case "voltage" -> p.quantity(how, Dimension.VOLTAGE, Range.NON_NEGATIVE);
                default -> p.quantity(how, Dimension.CURRENT_DENSITY, Range.NON_NEGATIVE)
                        .map(cd -> cd * cathodeAreaM2);
            };
            boolean ramp = p.has("ramp") ? p.bool("ramp").orElse(false) : false;
            if (at.isEmpty() || value.isEmpty() || (p.has("ramp") && p.bool("ramp").isEmpty())
                    || value.get().isNaN()) {
                ok = false;
                continue;
            }
            if (at.get() < lastAt) {
                TomlNode.Leaf atLeaf = (TomlNode.Leaf) t.get("at");
                p.log().error(atLeaf.valueAt(), p.key("at"), "schedule times must not decrease: '"
                        + atLeaf.text() + "' comes after '" + lastAtText + "'");
                ok = false;
                continue;
            }
            if (ramp && points.isEmpty()) {
                p.log().warning(p.at("ramp"), p.key("ramp"), "the first point has nothing to ramp from; ignored");
            }
            lastAt = at.get();
            lastAtText = ((TomlNode.Leaf) t.get("at")).text();
            points.add(new SetPoint(at.get(), value.get(), ramp));
        }
        if (!ok || points.isEmpty()) {
            return Optional.empty();
        }
        if (points.get(0).atS() > 0) {
            s.log().warning(s.at("schedule"), s.key("schedule"),
                    "the first point is after the start; until then the supply holds the first point's value");
        }
        return Optional.of(new Schedule(mode, points));
    }
}
