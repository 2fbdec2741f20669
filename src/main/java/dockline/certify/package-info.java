/**
 * Independent re-checking of a robot policy: the closed loop of the policy against every disturbance
 * choice, checked for the floor, avoided zones, legality and cycles, with the worst minimum level.
 * Entry points: {@link dockline.certify.CertificateChecker} for reserve policies (result a
 * {@link dockline.certify.Certificate}) and {@link dockline.certify.DiscountedCertificateChecker} for
 * policies of discounted missions, whose rows carry a score memory (result a
 * {@link dockline.certify.DiscountedCertificate} with the exact worst discounted score). This package
 * uses only the model, the arena and the policy's data, never the solver or its monitors.
 */
package dockline.certify;
