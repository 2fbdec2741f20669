package dockline.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.math.RoundingMode;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;

/**
 * The energy discretisation of missions/README.md, "robot": every rounding is against the robot. The expected
 * values below are hand-worked (the working is in the comments).
 */
class EnergyScaleTest {

    private static EnergyScale at(String unitWh) {
        return new EnergyScale(new BigDecimal(unitWh));
    }

    private static BigDecimal wh(String s) {
        return new BigDecimal(s);
    }

    @Example
    void consumption_rounds_up_and_gain_rounds_down() {
        EnergyScale s = at("0.1");
        assertThat(s.consumption(wh("0.5"))).isEqualTo(5);      // 0.5 / 0.1 = 5 exactly
        assertThat(s.consumption(wh("0.51"))).isEqualTo(6);     // 5.1 -> up to 6
        assertThat(s.consumption(wh("0.01"))).isEqualTo(1);     // 0.1 -> up to 1: never free
        assertThat(s.consumption(wh("0"))).isZero();
        assertThat(s.gain(wh("0.59"))).isEqualTo(5);            // 5.9 -> down to 5
        assertThat(s.gain(wh("0.09"))).isZero();                // 0.9 -> down to 0: no charging at all
        EnergyScale half = at("0.5");
        assertThat(half.consumption(wh("1.2"))).isEqualTo(3);   // 2.4 -> 3
        assertThat(half.gain(wh("1.2"))).isEqualTo(2);          // 2.4 -> 2
    }

    @Example
    void capacity_and_start_round_down_reserve_rounds_up() {
        EnergyScale s = at("0.5");
        assertThat(s.capacity(wh("60.4"))).isEqualTo(120);      // 120.8 -> 120
        assertThat(s.start(wh("48.9"))).isEqualTo(97);          // 97.8 -> 97
        assertThat(s.reserve(wh("12.1"))).isEqualTo(25);        // 24.2 -> 25
        assertThat(s.reserve(wh("12"))).isEqualTo(24);          // exact
    }

    @Example
    void diagonal_moves_cost_sqrt2_rounded_up_hand_worked() {
        // 0.5 Wh at 0.1 Wh: 5 units straight; diagonal 5*sqrt(2) = 7.07...; least u with u^2 >= 50:
        // 7^2 = 49 < 50 <= 64 = 8^2, so 8 units
        assertThat(at("0.1").diagonalConsumption(wh("0.5"))).isEqualTo(8);
        // 1 Wh at 0.5 Wh: 2 units straight; 2*sqrt(2) = 2.83; 2^2 = 4 < 8 <= 9 = 3^2, so 3
        assertThat(at("0.5").diagonalConsumption(wh("1"))).isEqualTo(3);
        // 0.3 Wh at 0.1 Wh: 3 units; 3*sqrt(2) = 4.24; 4^2 = 16 < 18 <= 25, so 5
        assertThat(at("0.1").diagonalConsumption(wh("0.3"))).isEqualTo(5);
        // 0.25 Wh at 0.5 Wh: half a unit; 0.5*sqrt(2) = 0.71, up to 1
        assertThat(at("0.5").diagonalConsumption(wh("0.25"))).isEqualTo(1);
        // 10 Wh at 1 Wh: 10*sqrt(2) = 14.14; 14^2 = 196 < 200 <= 225, so 15
        assertThat(at("1").diagonalConsumption(wh("10"))).isEqualTo(15);
        assertThat(at("1").diagonalConsumption(wh("0"))).isZero();
    }

    /**
     * The diagonal cost is the least u with u^2 >= 2 (a/b)^2, for a move of a/100 Wh at b/100 Wh
     * per unit, checked against exact integer arithmetic (u^2 b^2 >= 2 a^2 > (u-1)^2 b^2) and
     * against BigDecimal's square root at 40 digits (sqrt 2 is irrational, so the product is
     * never a whole number and 40 digits decide the ceiling).
     */
    @Property(tries = 500)
    void diagonal_is_the_exact_ceiling(@ForAll @IntRange(min = 1, max = 100_000) int a,
                                       @ForAll @IntRange(min = 1, max = 1_000) int b) {
        int u = at(BigDecimal.valueOf(b, 2).toPlainString()).diagonalConsumption(BigDecimal.valueOf(a, 2));
        BigInteger ua = BigInteger.valueOf(u);
        BigInteger lhs = ua.multiply(ua).multiply(BigInteger.valueOf(b).pow(2));
        BigInteger rhs = BigInteger.valueOf(a).pow(2).shiftLeft(1);
        BigInteger below = ua.subtract(BigInteger.ONE).pow(2).multiply(BigInteger.valueOf(b).pow(2));
        assertThat(lhs).isGreaterThanOrEqualTo(rhs);
        assertThat(below).isLessThan(rhs);
        BigDecimal ref = BigDecimal.valueOf(2).sqrt(new MathContext(40)).multiply(BigDecimal.valueOf(a))
                .divide(BigDecimal.valueOf(b), new MathContext(40)).setScale(0, RoundingMode.CEILING);
        assertThat(u).isEqualTo(ref.intValueExact());
    }

    @Example
    void percentages_are_exact() {
        // 20% of 60 Wh = 12 Wh; 12.5% of 150 Wh = 18.75 Wh; 33% of 0.1 Wh = 0.033 Wh
        assertThat(Charge.percent(wh("20")).toWh(wh("60"))).isEqualByComparingTo("12");
        assertThat(Charge.percent(wh("12.5")).toWh(wh("150"))).isEqualByComparingTo("18.75");
        assertThat(Charge.percent(wh("33")).toWh(wh("0.1"))).isEqualByComparingTo("0.033");
        assertThat(Charge.wh(wh("7")).toWh(wh("60"))).isEqualByComparingTo("7");
        // 33% of 100 Wh at 0.5 Wh: 33 Wh = 66 units either way; 33.3% = 33.3 Wh -> reserve 67, start 66
        EnergyScale s = at("0.5");
        assertThat(s.reserve(Charge.percent(wh("33.3")).toWh(wh("100")))).isEqualTo(67);
        assertThat(s.start(Charge.percent(wh("33.3")).toWh(wh("100")))).isEqualTo(66);
    }

    @Example
    void mission_start_is_capped_at_capacity() {
        // 60.4 Wh capacity at 0.5 Wh is 120 units (down); a start of 100% = 60.4 Wh is also 120
        RobotProfile r = new RobotProfile(wh("60.4"), wh("0.5"), java.util.Map.of("tile", wh("0.5")), wh("0.5"), wh("1"),
                Neighbourhood.FOUR);
        Mission m = new Mission("m", null, null, r, new Cell(0, 0), Charge.percent(wh("100")), Charge.percent(wh("20")),
                Tasks.justDock(), new Objective.Reserve());
        assertThat(m.capacityUnits()).isEqualTo(120);
        assertThat(m.startUnits()).isEqualTo(120);
        // 20% of 60.4 = 12.08 Wh = 24.16 units -> 25
        assertThat(m.reserveUnits()).isEqualTo(25);
    }

    @Example
    void overflow_is_an_error_not_a_wrap() {
        EnergyScale s = at("0.001");
        assertThat(s.capacity(wh("2147483.647"))).isEqualTo(Integer.MAX_VALUE);
        assertThatThrownBy(() -> s.capacity(wh("2147483.648"))).isInstanceOf(ArithmeticException.class);
        assertThatThrownBy(() -> s.consumption(wh("1e12"))).isInstanceOf(ArithmeticException.class);
        assertThatThrownBy(() -> s.diagonalConsumption(wh("1600000"))).isInstanceOf(ArithmeticException.class);
        assertThatThrownBy(() -> new EnergyScale(BigDecimal.ZERO)).isInstanceOf(IllegalArgumentException.class);
    }

    @Example
    void describe_states_the_rounding() {
        assertThat(at("0.50").describe()).startsWith("1 unit = 0.5 Wh").contains("rounded up").contains("rounded down");
        assertThat(at("0.5").formatWh(25)).isEqualTo("12.5 Wh");
    }
}
