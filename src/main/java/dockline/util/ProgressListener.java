package dockline.util;

/**
 * Receives the progress of long work: the phase in words and the per cent of it done. Each phase
 * begins with one report of 0 per cent; after it the per cent of that phase only rises (at most to 100).
 * A phase's name may come again later (a solve at another floor is a new phase). Called on the thread
 * doing the work, so it must be quick (the command line prints at most a few lines a second).
 */
@FunctionalInterface
public interface ProgressListener {

    void progress(String phase, int percent);
}
