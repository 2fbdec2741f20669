package dockline.io;

import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.Charge;
import dockline.model.EnergyScale;
import dockline.model.EventKind;
import dockline.model.EventRule;
import dockline.model.Neighbourhood;
import dockline.model.RobotProfile;
import dockline.model.Terrain;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/**
 * Reads a mission's {@code robot:} section (missions/README.md) into a {@link RobotProfile}, and makes
 * the checks that need the profile: every figure a whole number of energy units that fits an int at
 * the resolution, the start charge and the reserve against the capacity and each other, a move energy
 * for every surface the plan uses, the map's drag extras in units. Constant work per figure, the
 * surface check linear in the plan.
 */
final class RobotReading {

    static final String[] KEYS = {"capacity", "resolution", "move-energy", "wait-energy", "charge-rate", "neighbourhood", "tick"};

    private final Problems problems;
    private final Loading in;

    RobotReading(Loading in) {
        this.problems = in.problems;
        this.in = in;
    }

    /** The robot profile as read, with the nodes later checks point at. */
    static final class Robot {
        RobotProfile profile;
        EnergyScale scale;
        Node capacity;
        Node resolution;
        Pos moveKey;
        Map<String, Node> moveNodes = new LinkedHashMap<>();
        BigDecimal tick;
        Node tickNode;
    }

    /** The robot section as read; its profile is {@code null} after a problem. */
    Robot read(Node.Entry entry) {
        Node.MapNode m = in.map(entry.value(), "robot");
        if (m == null) {
            return null;
        }
        in.onlyKeys(m, "robot", KEYS);
        Robot r = new Robot();
        r.tickNode = m.get("tick");
        r.tick = r.tickNode == null ? null : ClockReading.tick(r.tickNode, problems);
        r.capacity = in.require(m, "capacity", "robot");
        r.resolution = in.require(m, "resolution", "robot");
        Node moveNode = in.require(m, "move-energy", "robot");
        Node waitNode = in.require(m, "wait-energy", "robot");
        BigDecimal capacity = r.capacity == null ? null : in.wh(r.capacity, "capacity");
        if (capacity != null && capacity.signum() == 0) {
            problems.add(r.capacity.pos(), "capacity must be more than 0 Wh", "the usable battery capacity, e.g. 120");
            capacity = null;
        }
        BigDecimal resolution = r.resolution == null ? null : in.wh(r.resolution, "resolution");
        if (resolution != null && resolution.signum() == 0) {
            problems.add(r.resolution.pos(), "resolution must be more than 0 Wh", "the size of one energy unit, e.g. 0.5");
            resolution = null;
        }
        EnergyScale scale = resolution == null ? null : new EnergyScale(resolution);
        r.scale = scale;
        Map<String, BigDecimal> move = new LinkedHashMap<>();
        boolean ok = true;
        if (moveNode != null) {
            r.moveKey = m.entry("move-energy").keyPos();
            Node.MapNode mm = in.map(moveNode, "move-energy");
            if (mm == null) {
                ok = false;
            } else {
                for (Node.Entry e : mm.entries()) {
                    r.moveNodes.put(e.key(), e.value());
                    BigDecimal wh = in.wh(e.value(), "move-energy for '" + Loading.shorten(e.key()) + "'");
                    if (wh == null) {
                        ok = false;
                        continue;
                    }
                    move.put(e.key(), wh);
                    r.moveNodes.put(e.key(), e.value());
                }
            }
        }
        BigDecimal wait = waitNode == null ? null : in.wh(waitNode, "wait-energy");
        BigDecimal charge = BigDecimal.ZERO;
        Node chargeNode = m.get("charge-rate");
        if (chargeNode != null) {
            charge = in.wh(chargeNode, "charge-rate");
        }
        Neighbourhood nb = Neighbourhood.FOUR;
        Node nn = m.get("neighbourhood");
        if (nn != null) {
            Integer v = in.integer(nn, "neighbourhood", 0, Integer.MAX_VALUE);
            if (v != null && v != 4 && v != 8) {
                problems.add(nn.pos(), "neighbourhood must be 4 or 8, not " + v,
                        "4: up, down, left, right; 8: also the diagonals");
                v = null;
            }
            nb = v == null ? null : v == 8 ? Neighbourhood.EIGHT : Neighbourhood.FOUR;
        }
        if (scale != null) {
            // every figure must be a whole number of units that fits an int at this resolution
            if (capacity != null) {
                BigDecimal cap = capacity;
                Integer units = units(() -> scale.capacity(cap), r.capacity.pos(), "capacity", cap, scale);
                if (units != null && units == 0) {
                    problems.add(r.capacity.pos(), "capacity " + capacity.toPlainString() + " Wh is less than one energy unit ("
                            + scale.unitWh().toPlainString() + " Wh)", "use a finer resolution");
                    capacity = null;
                } else if (units == null) {
                    capacity = null;
                }
            }
            for (Map.Entry<String, BigDecimal> e : move.entrySet()) {
                Node at = r.moveNodes.get(e.getKey());
                String what = "move-energy for '" + Loading.shorten(e.getKey()) + "'";
                ok &= units(() -> scale.consumption(e.getValue()), at.pos(), what, e.getValue(), scale) != null;
                if (nb == Neighbourhood.EIGHT) {
                    ok &= units(() -> scale.diagonalConsumption(e.getValue()), at.pos(), what + " (diagonal)",
                            e.getValue(), scale) != null;
                }
            }
            if (wait != null && units(() -> scale.consumption(wait), waitNode.pos(), "wait-energy", wait, scale) == null) {
                ok = false;
            }
            BigDecimal ch = charge;
            if (ch != null && units(() -> scale.gain(ch), chargeNode == null ? m.pos() : chargeNode.pos(), "charge-rate",
                    ch, scale) == null) {
                ok = false;
            }
        }
        if (ok && capacity != null && resolution != null && wait != null && charge != null && nb != null && moveNode != null) {
            r.profile = new RobotProfile(capacity, resolution, move, wait, charge, nb);
        }
        return r;
    }

    private Integer units(java.util.function.IntSupplier f, Pos pos, String what, BigDecimal wh, EnergyScale scale) {
        try {
            return f.getAsInt();
        } catch (ArithmeticException e) {
            problems.add(pos, what + ": " + wh.toPlainString() + " Wh does not fit in the solver's whole-number range at a resolution of "
                    + scale.unitWh().toPlainString() + " Wh (more than " + Integer.MAX_VALUE + " units)",
                    "use a coarser resolution, e.g. 0.5 Wh");
            return null;
        }
    }

    /** Starting charge and reserve floor against the capacity and each other. */
    void charges(Robot robot, Charge startCharge, Node startChargeNode, Node startNode, Charge reserve, Node resNode) {
        BigDecimal cap = robot.profile.capacityWh();
        EnergyScale scale = robot.scale;
        Integer startUnits = null;
        if (startCharge != null) {
            Pos at = startChargeNode != null ? startChargeNode.pos() : startNode != null ? startNode.pos() : Pos.START;
            if (!startCharge.percent() && startCharge.amount().compareTo(cap) > 0) {
                problems.add(at, "start charge " + startCharge + " is above the battery capacity of " + plain(cap) + " Wh",
                        "give at most " + plain(cap) + " Wh, or a percentage");
            } else {
                startUnits = units(() -> scale.start(startCharge.toWh(cap)), at, "start charge", startCharge.toWh(cap), scale);
            }
        }
        Integer resUnits = null;
        if (reserve != null) {
            if (!reserve.percent() && reserve.amount().compareTo(cap) > 0) {
                problems.add(resNode.pos(), "reserve " + reserve + " is above the battery capacity of " + plain(cap) + " Wh",
                        "give at most " + plain(cap) + " Wh, or a percentage, e.g. 20%");
            } else {
                resUnits = units(() -> scale.reserve(reserve.toWh(cap)), resNode.pos(), "reserve", reserve.toWh(cap), scale);
            }
        }
        if (startUnits != null && resUnits != null) {
            int capUnits = scale.capacity(cap);
            int s = Math.min(capUnits, startUnits);
            if (resUnits > s) {
                boolean byRounding = reserve.toWh(cap).compareTo(startCharge.toWh(cap)) <= 0;
                problems.add(resNode.pos(), "the reserve floor (" + describe(reserve, cap, resUnits, scale)
                                + ") is above the starting charge (" + describe(startCharge, cap, s, scale) + ")"
                                + (byRounding ? " after rounding to whole energy units" : ""),
                        byRounding ? "rounding is against the robot (reserve up, charge down); use a finer resolution"
                                : "lower the reserve or raise the start charge");
            }
        }
    }

    private static String describe(Charge c, BigDecimal cap, int units, EnergyScale scale) {
        String wh = plain(c.toWh(cap)) + " Wh";
        return (c.percent() ? c + " = " + wh : wh) + ", " + units + " units of " + plain(scale.unitWh()) + " Wh";
    }

    private static String plain(BigDecimal d) {
        return d.stripTrailingZeros().toPlainString();
    }

    /** Every surface the plan uses needs a move energy. */
    void surfaces(Robot robot, BuildingMap map) {
        if (robot.moveKey == null) {
            return; // move-energy is missing or broken; already reported
        }
        Set<String> used = new TreeSet<>();
        Set<String> legendSurfaces = new HashSet<>();
        for (Terrain t : map.legend().values()) {
            if (t.free()) {
                legendSurfaces.add(t.surface());
            }
        }
        for (int y = 0; y < map.height(); y++) {
            for (int x = 0; x < map.width(); x++) {
                Terrain t = map.terrainAt(new Cell(x, y));
                if (t.free()) {
                    used.add(t.surface());
                }
            }
        }
        Set<String> given = robot.moveNodes.keySet();
        List<String> strays = new ArrayList<>();
        for (String g : given) {
            if (!legendSurfaces.contains(g)) {
                strays.add(g);
            }
        }
        for (String s : used) {
            if (!given.contains(s)) {
                String near = Spelling.closest(s, strays);
                problems.add(robot.moveKey, "no move energy for surface '" + Loading.shorten(s) + "', which the plan uses",
                        near != null ? "'" + near + "' at " + robot.moveNodes.get(near).pos() + " looks like a misspelling of it"
                                : "add '" + Loading.shorten(s) + ": <Wh per cell>' under move-energy");
            }
        }
    }

    /** A drag's extra energy must fit in units too (the arena adds it to a move). */
    void drags(Robot robot, BuildingMap map) {
        if (robot.scale == null) {
            return;
        }
        Set<BigDecimal> seen = new HashSet<>();
        for (EventRule rule : map.disturbances().rules()) {
            if (rule.kind() == EventKind.DRAG && seen.add(rule.extraWh())) {
                try {
                    robot.scale.consumption(rule.extraWh());
                } catch (ArithmeticException e) {
                    problems.add(robot.resolution.pos(), "the map's drag extra of " + plain(rule.extraWh())
                            + " Wh does not fit in the solver's whole-number range at this resolution", "use a coarser resolution");
                }
            }
        }
    }
}
