/**
 * The desktop window and the headless picture (the only package that imports {@code javafx.*}).
 *
 * <p>Start with {@link dockline.view.ViewData}, the view's own narrow model of a solved mission
 * (verdict in words, charge needed per cell, policy look-ups, replays), built by
 * {@link dockline.view.SolverAnalyzer} from the solver's analysis. {@link dockline.view.MissionWindow}
 * is the window ({@link dockline.view.ViewLauncher} opens it without an {@code Application}
 * subclass); {@link dockline.view.PictureRenderer} draws the same map, keys and battery chart into a
 * PNG with the Monocle headless glass and the software renderer. Solving runs in a
 * {@code javafx.concurrent.Task} built from immutable inputs that passes {@code this::isCancelled}
 * down to the solver.
 */
package dockline.view;
