/**
 * The policy the robot runs, as plain data: one row per situation (cell, level, budget left, task
 * progress, score memory) with the action to take; written by the solvers, read by the checker and files.
 *
 * <p>Start at {@link dockline.policy.Policy}. Imports only the model and the arena's action records,
 * so the certificate checker and the policy files can use it without the solver.
 */
package dockline.policy;
