package dockline.monitor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;

/** The battery automaton of maps/README.md, "Game semantics": level ← min(capacity, level + delta), lost below
 * the floor. */
class ReserveMonitorTest {

    @Example
    void stepsSaturateAtCapacityAndRejectBelowTheFloor() {
        ReserveMonitor m = new ReserveMonitor(20, 100, 57);
        int s = m.initialState();
        assertThat(m.level(s)).isEqualTo(57);
        assertThat(m.level(m.step(s, -37))).isEqualTo(20);
        assertThat(m.step(s, -38)).isEqualTo(Monitor.REJECT);
        assertThat(m.level(m.step(s, 60))).isEqualTo(100);
        assertThat(m.stateBound()).isEqualTo(81);
        assertThat(m.acceptsAtCompletion(0)).isTrue();
    }

    @Example
    void startBelowTheFloorIsRejectedAtOnce_andAboveCapacityIsCut() {
        assertThat(new ReserveMonitor(5, 10, 4).initialState()).isEqualTo(Monitor.REJECT);
        assertThat(new ReserveMonitor(5, 10, 40).startUnits()).isEqualTo(10);
    }

    @Example
    void floorAboveCapacityOrNegative_isRefused() {
        assertThatThrownBy(() -> new ReserveMonitor(11, 10, 10)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new ReserveMonitor(-1, 10, 10)).isInstanceOf(IllegalArgumentException.class);
    }

    /** The step agrees with the formula of maps/README.md, "Game semantics" and stays inside 0 .. stateBound-1. */
    @Property(tries = 500)
    void stepMatchesTheFormula(@ForAll @IntRange(min = 0, max = 50) int floor, @ForAll @IntRange(min = 0, max = 50) int extra,
                               @ForAll @IntRange(min = 0, max = 100) int level, @ForAll @IntRange(min = -120, max = 120) int w) {
        int cap = floor + extra;
        ReserveMonitor m = new ReserveMonitor(floor, cap, cap);
        int s = m.stateOf(level);
        if (level < floor) {
            assertThat(s).isEqualTo(Monitor.REJECT);
            return;
        }
        int expected = Math.min(cap, Math.min(level, cap) + w);
        int next = m.step(s, w);
        if (expected < floor) {
            assertThat(next).isEqualTo(Monitor.REJECT);
        } else {
            assertThat(m.level(next)).isEqualTo(expected);
            assertThat((long) next).isBetween(0L, m.stateBound() - 1);
        }
    }
}
