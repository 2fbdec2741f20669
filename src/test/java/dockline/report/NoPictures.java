package dockline.report;

import dockline.model.Mission;
import dockline.plan.Plan;
import dockline.replay.Replay;

/** Pictures that draw nothing: for report tests that read figures and words only. */
final class NoPictures {

    static final Pictures NONE = new Pictures() {
        @Override
        public byte[] oneTrip(Plan plan) {
            return null;
        }

        @Override
        public byte[] run(Mission mission, Replay run, boolean guaranteed, String headline) {
            return null;
        }
    };

    private NoPictures() {
    }
}
