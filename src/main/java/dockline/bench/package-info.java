/**
 * Generated buildings and missions for tests and the benchmark, and the benchmark runner that
 * measures every solving method on them in one run.
 *
 * <p>Start with {@link dockline.bench.BuildingGenerator#generate(int, long, int)} and
 * {@link dockline.bench.MissionGenerator#generate(dockline.model.BuildingMap, dockline.bench.MissionSpec, long)}.
 */
package dockline.bench;
