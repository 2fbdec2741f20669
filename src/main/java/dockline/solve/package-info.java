/**
 * Solving the product game: linear-time attractors, strategy extraction, and the policy the robot runs.
 */
package dockline.solve;
