/**
 * Occupancy images to building maps: readers for Netpbm greyscale and bitmap images
 * ({@link dockline.raster.NetpbmReader}, after the Netpbm project's pgm(5) and pbm(5) format pages)
 * and PNG ({@link dockline.raster.PngReader}, the JDK's image I/O), grey-level classification
 * ({@link dockline.raster.Thresholds}), conservative down-sampling to cells
 * ({@link dockline.raster.Downsampler}), the robot's footprint by an exact Euclidean distance
 * transform ({@link dockline.raster.DistanceTransform}, Felzenszwalb and Huttenlocher 2012;
 * {@link dockline.raster.Footprint}), connected free areas ({@link dockline.raster.FreeAreas}) and
 * the map writer ({@link dockline.raster.MapText}).
 *
 * <p>Entry point: {@link dockline.raster.Importer#run}. The package uses {@code model} and
 * {@code io} only (never {@code cli} or {@code view}).
 */
package dockline.raster;
