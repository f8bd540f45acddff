package dev.morse.spark;

import dev.morse.poset.Adjacency;
import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import java.io.Serializable;

/**
 * A poset in the few arrays it takes to send it to other machines: its labels, by id, and its covers
 * as two parallel arrays. {@link #rebuild()} gives back a poset with the same ids, so that the ids in
 * the intervals sent with it mean the same elements there as here. The arrays are the shipment's
 * own, not copied: read them, do not change them.
 *
 * @param labels the label of each element, by id
 * @param coverLowers the lower end of each cover
 * @param coverUppers the upper end of each cover, parallel to {@code coverLowers}
 */
public record PosetShipment(String[] labels, int[] coverLowers, int[] coverUppers) implements Serializable {
    private static final long serialVersionUID = 1L;

    /** The shipment of {@code poset}. */
    public static PosetShipment of(Poset poset) {
        int n = poset.size();
        String[] labels = new String[n];
        for (int x = 0; x < n; x++) {
            labels[x] = poset.label(x);
        }
        Adjacency below = poset.lowerCovers();
        return new PosetShipment(labels, below.edgeTargets(), below.edgeSources());
    }

    /** The number of elements. */
    public int size() {
        return labels.length;
    }

    /**
     * The poset again, each element with the id it had.
     *
     * @throws IllegalStateException if the labels are not distinct (a shipment not made by {@link #of})
     */
    public Poset rebuild() {
        PosetBuilder builder = new PosetBuilder();
        for (int x = 0; x < labels.length; x++) {
            if (builder.element(labels[x]) != x) {
                throw new IllegalStateException("label " + labels[x] + " appears twice");
            }
        }
        for (int i = 0; i < coverLowers.length; i++) {
            builder.relate(coverLowers[i], coverUppers[i], 0);
        }
        return builder.buildKnownAcyclic();
    }
}
