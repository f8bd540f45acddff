package dev.morse.complex;

/**
 * Computes a coboundary (the transpose of a boundary) on first request and keeps it. Many callers
 * only need the boundary, so the transpose is not paid for up front. Thread-safe.
 */
public final class CoboundaryCache {
    private final Boundary boundary;
    private volatile Boundary coboundary;

    /** A cache for the transpose of {@code boundary}, computed on first request. */
    public CoboundaryCache(Boundary boundary) {
        this.boundary = boundary;
    }

    /** The transpose, computed on the first call. */
    public Boundary get() {
        Boundary result = coboundary;
        if (result == null) {
            synchronized (this) {
                result = coboundary;
                if (result == null) {
                    result = boundary.transpose(boundary.cellCount());
                    coboundary = result;
                }
            }
        }
        return result;
    }
}
