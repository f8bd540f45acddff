package dev.morse.cw;

/**
 * The outcome of checking a poset for being a CW poset: the verdict and, when it passed, an
 * incidence sign for every cover, indexed like the poset's lower-cover CSR entries. One byte per
 * cover.
 */
final class CwStructure {
    private final CwPosetVerdict verdict;
    private final byte[] coverSigns;

    private CwStructure(CwPosetVerdict verdict, byte[] coverSigns) {
        this.verdict = verdict;
        this.coverSigns = coverSigns;
    }

    static CwStructure passed(byte[] coverSigns) {
        return new CwStructure(CwPosetVerdict.passed(), coverSigns);
    }

    static CwStructure failed(String reason) {
        return new CwStructure(CwPosetVerdict.failed(reason), null);
    }

    CwPosetVerdict verdict() {
        return verdict;
    }

    /** Signs ε(x, y) = ±1 on each cover y ⋖ x at y's index in x's lower-cover row; null after a failure. */
    byte[] coverSigns() {
        return coverSigns;
    }
}
