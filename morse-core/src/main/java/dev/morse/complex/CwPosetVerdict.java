package dev.morse.complex;

/**
 * Whether a poset is a CW poset, and why (or why not) in words fit for a report.
 *
 * @param isCwPoset whether the check passed
 * @param reason a one-line explanation
 */
public record CwPosetVerdict(boolean isCwPoset, String reason) {
}
