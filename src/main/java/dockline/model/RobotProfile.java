package dockline.model;

import java.math.BigDecimal;
import java.util.Map;

/**
 * The robot's energy figures, all in Wh.
 *
 * @param capacityWh      usable battery capacity
 * @param resolutionWh    size of one energy unit (e.g. 0.1 Wh); all solving is in whole units
 * @param moveWh          energy to enter one cell, per surface name
 * @param waitWh          energy for one idle step (waiting, or being stopped by a shut door or a blockage)
 * @param chargeWh        charge gained per step spent charging on a dock (zero: no charging)
 * @param neighbourhood   4- or 8-neighbourhood
 */
public record RobotProfile(BigDecimal capacityWh, BigDecimal resolutionWh, Map<String, BigDecimal> moveWh,
                           BigDecimal waitWh, BigDecimal chargeWh, Neighbourhood neighbourhood) {

    public RobotProfile {
        moveWh = Map.copyOf(moveWh);
        if (capacityWh.signum() <= 0 || resolutionWh.signum() <= 0) {
            throw new IllegalArgumentException("capacity and resolution must be positive");
        }
        if (waitWh.signum() < 0 || chargeWh.signum() < 0) {
            throw new IllegalArgumentException("wait and charge energy must not be negative");
        }
        for (BigDecimal v : moveWh.values()) {
            if (v.signum() < 0) {
                throw new IllegalArgumentException("move energy must not be negative");
            }
        }
    }

    public EnergyScale scale() {
        return new EnergyScale(resolutionWh);
    }
}
