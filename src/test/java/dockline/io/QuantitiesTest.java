package dockline.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import dockline.model.Charge;
import java.math.BigDecimal;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.BigRange;
import net.jqwik.api.constraints.Scale;

class QuantitiesTest {

    @Example
    void charges_as_written_on_a_command_line() {
        assertThat(Quantities.parseCharge("20%")).isEqualTo(Charge.percent(new BigDecimal("20")));
        assertThat(Quantities.parseCharge(" 7.5 % ")).isEqualTo(Charge.percent(new BigDecimal("7.5")));
        assertThat(Quantities.parseCharge("15 Wh")).isEqualTo(Charge.wh(new BigDecimal("15")));
        assertThat(Quantities.parseCharge("15wh")).isEqualTo(Charge.wh(new BigDecimal("15")));
        assertThat(Quantities.parseCharge("15")).isEqualTo(Charge.wh(new BigDecimal("15")));
        assertThat(Quantities.parseCharge("0.125 Wh").amount()).isEqualByComparingTo("0.125");
        assertThat(Quantities.parseCharge("100%").percent()).isTrue();
    }

    @Example
    void bad_charges_say_what_is_wrong() {
        assertThatThrownBy(() -> Quantities.parseCharge("120%")).isInstanceOf(IllegalArgumentException.class)
                .hasMessage("'120%' is above 100% of the battery");
        assertThatThrownBy(() -> Quantities.parseCharge("-5%")).hasMessageContaining("negative");
        assertThatThrownBy(() -> Quantities.parseCharge("")).hasMessageContaining("not a charge");
        assertThatThrownBy(() -> Quantities.parseCharge("lots")).hasMessageContaining("'lots' is not a decimal number");
        assertThatThrownBy(() -> Quantities.parseCharge("15 W")).hasMessageContaining("is not a decimal number");
        assertThatThrownBy(() -> Quantities.parseCharge("1e3 Wh")).hasMessageContaining("without an exponent");
        assertThatThrownBy(() -> Quantities.parseCharge("12345678901234567890")).hasMessageContaining("too large");
        assertThatThrownBy(() -> Quantities.parseCharge(null)).isInstanceOf(IllegalArgumentException.class);
    }

    @Example
    void decimals_are_exact_and_strict() {
        assertThat(Quantities.parseDecimal("0.1").toPlainString()).isEqualTo("0.1");
        assertThat(Quantities.parseDecimal("-0.75")).isEqualByComparingTo("-0.75");
        assertThat(Quantities.parseDecimal("+3")).isEqualByComparingTo("3");
        assertThat(Quantities.parseDecimal(".5")).isEqualByComparingTo("0.5");
        assertThat(Quantities.parseDecimal("5.")).isEqualByComparingTo("5");
        assertThat(Quantities.parseDecimal("007")).isEqualByComparingTo("7");
        for (String bad : new String[] {"", ".", "-", "1.2.3", "1,5", "0x10", "1_000", "NaN", "Infinity", "1e5", "٣"}) {
            assertThatThrownBy(() -> Quantities.parseDecimal(bad)).as(bad).isInstanceOf(IllegalArgumentException.class);
        }
        assertThatThrownBy(() -> Quantities.parseDecimal("0.0000000001")).hasMessageContaining("too many decimals");
    }

    @Example
    void wh_accepts_a_unit_and_rejects_percent_and_negatives() {
        assertThat(Quantities.parseWh("0.5 Wh")).isEqualByComparingTo("0.5");
        assertThat(Quantities.parseWh("2")).isEqualByComparingTo("2");
        assertThatThrownBy(() -> Quantities.parseWh("5%")).hasMessageContaining("percentage");
        assertThatThrownBy(() -> Quantities.parseWh("-1")).hasMessageContaining("negative");
    }

    @Example
    void check_against_capacity() {
        BigDecimal cap = new BigDecimal("60");
        assertThat(Quantities.checkAgainstCapacity(Charge.wh(new BigDecimal("60")), cap)).isNull();
        assertThat(Quantities.checkAgainstCapacity(Charge.wh(new BigDecimal("60.5")), cap)).contains("above the battery capacity");
        assertThat(Quantities.checkAgainstCapacity(Charge.percent(new BigDecimal("100")), cap)).isNull();
    }

    /** Whatever decimal BigDecimal prints, parseDecimal reads back the same value (BigDecimal is the reference). */
    @Property(tries = 300)
    void round_trips_plain_decimals(@ForAll @BigRange(min = "-999999999999", max = "999999999999") @Scale(6) BigDecimal d) {
        assertThat(Quantities.parseDecimal(d.toPlainString())).isEqualByComparingTo(d);
    }
}
