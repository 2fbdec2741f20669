package dockline.solve.discounted;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.Charge;
import dockline.model.DisturbanceModel;
import dockline.model.Mission;
import dockline.model.Neighbourhood;
import dockline.model.Objective;
import dockline.model.Rational;
import dockline.model.Relation;
import dockline.model.RobotProfile;
import dockline.model.Tasks;
import dockline.model.Terrain;
import dockline.solve.RandomArenas;
import java.math.BigDecimal;
import java.util.List;
import java.util.Map;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;

/** The value-iteration baseline against closed forms and exact finite-horizon values. */
class DiscountedValueIterationTest {

    static Mission corridor(String row, int tileWh, int waitWh, int chargeWh) {
        Map<Character, Terrain> legend = Map.of('.', new Terrain('.', "tile", false, false),
                'C', new Terrain('C', "tile", true, false));
        BuildingMap map = new BuildingMap("corridor", null, BigDecimal.ONE, List.of(row), legend, List.of(), Map.of(),
                DisturbanceModel.none());
        RobotProfile robot = new RobotProfile(BigDecimal.valueOf(100), BigDecimal.ONE,
                Map.of("tile", BigDecimal.valueOf(tileWh)), BigDecimal.valueOf(waitWh), BigDecimal.valueOf(chargeWh),
                Neighbourhood.FOUR);
        return new Mission("corridor", null, map, robot, new Cell(0, 0), Charge.wh(BigDecimal.TEN),
                Charge.wh(BigDecimal.ZERO), Tasks.justDock(), new Objective.Reserve());
    }

    @Example
    void chargingForever_hasTheGeometricValue() {
        // one dock cell, charge 3 per step: the best play charges forever, DS = 3 d/(d-1) (geometric series)
        Arena a = ArenaCompiler.compile(corridor("C", 1, 1, 3));
        assertThat(new DiscountedValueIteration(a, 2).solve().exactValue()).isEqualTo(Rational.of(6));
        assertThat(new DiscountedValueIteration(a, 3).solve().exactValue()).isEqualTo(Rational.of(9, 2));
    }

    @Example
    void walkingToTheDock_thenCharging() {
        // ".C", start at 0:0: move (-2), then charge 3 forever: -2 + (1/2) * 6 = 1 with d = 2;
        // waiting forever costs -1 * 2 = -2; so the value is 1 (hand-worked with the geometric series)
        Arena a = ArenaCompiler.compile(corridor(".C", 2, 1, 3));
        DiscountedValueIteration vi = new DiscountedValueIteration(a, 2);
        assertThat(vi.solve().exactValue()).isEqualTo(Rational.of(1));
        assertThat(vi.decide(Rational.of(1), Relation.AT_LEAST).holds()).isTrue();
        assertThat(vi.decide(Rational.of(1), Relation.ABOVE).holds()).isFalse();
        assertThat(vi.decide(Rational.of(999, 1000), Relation.ABOVE).holds()).isTrue();
        assertThat(vi.decide(Rational.of(1001, 1000), Relation.AT_LEAST).holds()).isFalse();
        // far thresholds are decided by the enclosure alone, without exact recovery
        assertThat(vi.decide(Rational.of(-5), Relation.ABOVE).exactValue()).isNull();
    }

    /** Exact T^n(0) in rationals: the value of the n-step game, by plain backward induction. */
    static Rational[] finiteHorizon(Arena a, int d, int n) {
        Rational[] x = new Rational[a.robotCount()];
        java.util.Arrays.fill(x, Rational.ZERO);
        for (int k = 0; k < n; k++) {
            Rational[] y = new Rational[x.length];
            for (int r = 0; r < a.robotCount(); r++) {
                Rational best = null;
                for (int e = a.outBegin(r); e < a.outEnd(r); e++) {
                    int act = a.target(e);
                    Rational worst = null;
                    for (int f = a.outBegin(act); f < a.outEnd(act); f++) {
                        Rational c = Rational.of(a.weight(f)).add(x[a.target(f)].multiply(Rational.of(1, d)));
                        worst = worst == null || c.compareTo(worst) < 0 ? c : worst;
                    }
                    best = best == null || worst.compareTo(best) > 0 ? worst : best;
                }
                y[r] = best;
            }
            x = y;
        }
        return x;
    }

    @Property(tries = 200)
    void exactValue_isWithinTheStoppingBoundOfTheFiniteHorizonValue(@ForAll long seed,
                                                                  @ForAll @IntRange(min = 2, max = 4) int d) {
        // Zwick & Paterson (1996): |val - T^n(0)| <= mu d / (d^n (d-1)) = mu / (d^(n-1) (d-1))
        Arena a = RandomArenas.arena(seed, 3, 2);
        Rational val = new DiscountedValueIteration(a, d).solve().exactValue();
        int n = 6;
        Rational vn = finiteHorizon(a, d, n)[a.startVertex()];
        long dn = 1;
        for (int i = 0; i < n - 1; i++) {
            dn *= d;
        }
        Rational bound = Rational.of(a.maxAbsWeight(), dn * (d - 1));
        assertThat(val.subtract(vn).compareTo(bound)).isLessThanOrEqualTo(0);
        assertThat(vn.subtract(val).compareTo(bound)).isLessThanOrEqualTo(0);
    }

    @Property(tries = 200)
    void optimalPlay_hasTheExactValue_byTheLassoFormula(@ForAll long seed, @ForAll @IntRange(min = 2, max = 4) int d) {
        // the play of the two optimal positional strategies is a lasso u x^omega; its DS by the
        // geometric series (DiscountedClosedForms) must be the value, and the value must
        // lie in the enclosure
        Arena a = RandomArenas.arena(seed, 3, 3);
        DiscountedValueIteration.Result res = new DiscountedValueIteration(a, d).solve();
        assertThat(res.strategiesOptimal()).isTrue();
        DiscountedValueIteration.Lasso play = res.play();
        int[] weights = new int[play.length()];
        for (int i = 0; i < play.length(); i++) {
            int r = play.vertices()[i];
            weights[i] = a.weight(res.outcomeChoice(res.robotChoice(r)));
        }
        int[] u = java.util.Arrays.copyOfRange(weights, 0, play.loopStart());
        int[] x = java.util.Arrays.copyOfRange(weights, play.loopStart(), weights.length);
        assertThat(dockline.monitor.DiscountedClosedForms.lassoValue(u, x, d)).isEqualTo(res.exactValue());
        assertThat(res.lower().compareTo(res.exactValue())).isLessThanOrEqualTo(0);
        assertThat(res.upper().compareTo(res.exactValue())).isGreaterThanOrEqualTo(0);
    }
}
