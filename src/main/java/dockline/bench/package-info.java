/**
 * Generated buildings and missions for tests and the benchmark, the benchmark runner that measures
 * every solving method on them in one run, and the benchmark's own discounted comparator games.
 *
 * <p>Start with {@link dockline.bench.BuildingGenerator#generate(int, long, int)},
 * {@link dockline.bench.MissionGenerator#generate(dockline.model.BuildingMap, dockline.bench.MissionSpec, long)}
 * and {@link dockline.bench.Benchmark}; {@link dockline.bench.DiscountedBench} times the discounted routes.
 */
package dockline.bench;
