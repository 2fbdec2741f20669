/**
 * Independent re-checking of a robot policy: the closed loop of the policy against every disturbance
 * choice, checked for the floor, avoided zones, legality and cycles, with the worst minimum level.
 * Entry point: {@link dockline.certify.CertificateChecker}; the result is a {@link dockline.certify.Certificate}.
 * This package uses only the model, the arena and the policy's data, never the solver.
 */
package dockline.certify;
