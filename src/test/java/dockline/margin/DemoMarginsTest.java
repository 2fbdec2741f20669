package dockline.margin;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.io.MissionLoader;
import dockline.model.Mission;
import dockline.solve.ProductOptions;
import dockline.solve.reserve.ReserveOptions;
import dockline.solve.reserve.ReserveSolver;
import java.nio.file.Path;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

class DemoMarginsTest {

    /**
     * The fixpoint (optimisation) and the bisection over the threshold solver (satisficing) agree on
     * every demo mission, and with the solver's own highest-floor search (ReserveSolver.analyse).
     */
    @ParameterizedTest
    @MethodSource("dockline.fixtures.DemoFiles#missions")
    void bothMethodsAgree(Path file) throws Exception {
        Mission m = MissionLoader.load(file);
        MarginReport r = Margins.compute(m, ProductOptions.defaults());
        assertThat(r.agree()).as("%s", r).isTrue();
        var analysis = ReserveSolver.analyse(m, ReserveOptions.defaults());
        assertThat(r.highestReserveUnits()).isEqualTo(analysis.highestGuaranteedReserveUnits());
        assertThat(r.guaranteed()).isEqualTo(analysis.guaranteed());
        assertThat(r.suggestions().isEmpty()).isEqualTo(r.guaranteed());
    }
}
