package dev.morse.matching;

/** The verifier's finding: valid, or the first defect found in words. */
public record MatchingVerdict(boolean valid, String defect) {
    /** The verdict for a valid matching. */
    public static final MatchingVerdict VALID = new MatchingVerdict(true, "");

    /** Requires a defect exactly when invalid. */
    public MatchingVerdict {
        if (valid != defect.isEmpty()) {
            throw new IllegalArgumentException("a defect is given exactly for invalid matchings");
        }
    }

    /** An invalid verdict. */
    public static MatchingVerdict invalid(String defect) {
        return new MatchingVerdict(false, defect);
    }
}
