package dev.morse.cw;

/**
 * Whether a poset is a CW poset, and if not, why: the reason names the first element or interval
 * that fails, by its labels.
 *
 * @param isCwPoset whether every check passed
 * @param reason empty exactly when {@code isCwPoset}; otherwise one line for users
 */
public record CwPosetVerdict(boolean isCwPoset, String reason) {
    /** Validates that a reason is given exactly for a failure. */
    public CwPosetVerdict {
        if (reason == null) {
            throw new IllegalArgumentException("reason must not be null");
        }
        if (isCwPoset != reason.isEmpty()) {
            throw new IllegalArgumentException("a reason is given exactly when the check fails");
        }
    }

    /** The verdict for a CW poset. */
    public static CwPosetVerdict passed() {
        return new CwPosetVerdict(true, "");
    }

    /** The verdict for a poset that is not a CW poset, for the given reason. */
    public static CwPosetVerdict failed(String reason) {
        return new CwPosetVerdict(false, reason);
    }
}
