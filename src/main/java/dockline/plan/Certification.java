package dockline.plan;

import dockline.certify.Certificate;
import dockline.certify.DiscountedCertificate;
import java.util.Optional;

/**
 * What the independent certificate check said about the plan's policy. A plan is never reported as
 * guaranteed on a policy that failed it: the front ends turn {@link #problem()} into an internal error.
 */
public sealed interface Certification permits Certification.Reserve, Certification.Discounted,
        Certification.NotChecked {

    /** Whether a certificate was computed and passed. */
    boolean ok();

    /** What is wrong with a computed certificate (failed, or its worst case differs from the solver's). */
    Optional<String> problem();

    /** The reserve policy's certificate ({@link dockline.certify.CertificateChecker}). */
    record Reserve(Certificate certificate, Optional<String> problem) implements Certification {
        @Override
        public boolean ok() {
            return problem.isEmpty() && certificate.ok();
        }
    }

    /** The discounted policy's certificate ({@link dockline.certify.DiscountedCertificateChecker}). */
    record Discounted(DiscountedCertificate certificate, Optional<String> problem) implements Certification {
        @Override
        public boolean ok() {
            return problem.isEmpty() && certificate.ok();
        }
    }

    /**
     * Nothing was certified.
     *
     * @param why in words (no policy to check, verdict only, or a closed loop over the limit)
     */
    record NotChecked(String why) implements Certification {
        @Override
        public boolean ok() {
            return false;
        }

        @Override
        public Optional<String> problem() {
            return Optional.empty();
        }
    }
}
