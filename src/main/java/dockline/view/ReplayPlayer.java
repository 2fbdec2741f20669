package dockline.view;

import javafx.animation.Animation;
import javafx.animation.KeyFrame;
import javafx.animation.Timeline;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.DoubleProperty;
import javafx.beans.property.IntegerProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleDoubleProperty;
import javafx.beans.property.SimpleIntegerProperty;
import javafx.util.Duration;

/**
 * Plays a replay: the current step, play / pause, step back and forward, and a speed in steps per
 * second. Playing advances one step per tick on the FX thread and pauses at the last step; a run
 * with a loop (a patrol's lap) goes on from the last step to the loop's first step, for ever.
 */
final class ReplayPlayer {

    private final IntegerProperty step = new SimpleIntegerProperty(this, "step", 0);
    private final IntegerProperty last = new SimpleIntegerProperty(this, "last", 0);
    private final DoubleProperty speed = new SimpleDoubleProperty(this, "speed", 2.0);
    private final BooleanProperty playing = new SimpleBooleanProperty(this, "playing", false);
    private int loopStart = -1;
    private long wraps;
    private Timeline timeline;

    ReplayPlayer() {
        speed.addListener((o, a, b) -> {
            if (playing.get()) {
                restartTimeline();
            }
        });
    }

    IntegerProperty stepProperty() {
        return step;
    }

    int step() {
        return step.get();
    }

    DoubleProperty speedProperty() {
        return speed;
    }

    ReadOnlyBooleanProperty playingProperty() {
        return playing;
    }

    /** A new run of {@code length} actions that ends: back to step 0, paused. */
    void load(int length) {
        load(length, -1);
    }

    /**
     * A new run of {@code length} actions: back to step 0, paused. With {@code loopStart} of 0 or
     * more the step after the last is {@code loopStart} again (a patrol's lap).
     */
    void load(int length, int loopStart) {
        pause();
        last.set(Math.max(0, length));
        this.loopStart = loopStart >= 0 && loopStart <= last.get() ? loopStart : -1;
        wraps = 0;
        step.set(0);
    }

    /** The first step of the loop, or -1 for a run that ends. */
    int loopStart() {
        return loopStart;
    }

    /** How often the player went from the last step back to the loop's first step since the run was loaded. */
    long wraps() {
        return wraps;
    }

    void stepForward() {
        if (step.get() < last.get()) {
            step.set(step.get() + 1);
        } else if (loopStart >= 0 && last.get() > 0) {
            wraps++;
            step.set(loopStart);
            return;
        }
        if (step.get() >= last.get() && loopStart < 0) {
            pause();
        }
    }

    void stepBack() {
        pause();
        if (step.get() > 0) {
            step.set(step.get() - 1);
        }
    }

    void toStart() {
        pause();
        step.set(0);
    }

    /** Pauses and goes to the step (clamped to the run). */
    void jumpTo(int s) {
        pause();
        step.set(Math.max(0, Math.min(s, last.get())));
    }

    void toEnd() {
        pause();
        step.set(last.get());
    }

    void togglePlay() {
        if (playing.get()) {
            pause();
        } else {
            play();
        }
    }

    void play() {
        if (last.get() == 0) {
            return;
        }
        if (step.get() >= last.get() && loopStart < 0) {
            step.set(0);
        }
        playing.set(true);
        restartTimeline();
    }

    void pause() {
        playing.set(false);
        if (timeline != null) {
            timeline.stop();
            timeline = null;
        }
    }

    private void restartTimeline() {
        if (timeline != null) {
            timeline.stop();
        }
        double perStep = 1.0 / Math.max(0.1, speed.get());
        timeline = new Timeline(new KeyFrame(Duration.seconds(perStep), e -> stepForward()));
        timeline.setCycleCount(Animation.INDEFINITE);
        timeline.play();
    }
}
