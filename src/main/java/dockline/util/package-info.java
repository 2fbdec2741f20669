/**
 * Primitive collections used by the solver, the certificate checker and the margins alike: a
 * growable int array and a long-to-int hash map, with no boxing and no per-entry objects.
 *
 * <p>Also where the core reports progress ({@link dockline.util.Progress}, {@link dockline.util.ProgressListener}):
 * one listener type for the stages of a job and the phases inside them; the command line, the window and
 * the report listen; the core never knows who listens.
 *
 * <p>Entry points: {@link dockline.util.IntArrayList} and {@link dockline.util.LongIntMap}. This
 * package depends on nothing else of dockline, so sharing it keeps the certificate checker
 * independent of the solver (DEVELOPERS.md, "Layout"): they share containers, never logic.
 */
package dockline.util;
