package dev.morse.generate;

import dev.morse.complex.Facets;
import dev.morse.image.VoxelSet;
import dev.morse.io.InputFormat;
import dev.morse.io.PosetWriter;
import dev.morse.io.SimplicialWriter;
import dev.morse.poset.Poset;
import java.io.IOException;
import java.io.Writer;
import java.util.Objects;

/**
 * One generated input, ready to be written in its format with a comment line saying what it is.
 */
public sealed interface Generated permits Generated.OfPoset, Generated.OfFacets, Generated.OfVoxels {
    /** What it is, for the comment line and for people. */
    String description();

    /** The format it is written in: simplicial for facets, the poset format otherwise. */
    default InputFormat format() {
        return this instanceof OfFacets ? InputFormat.SIMPLICIAL : InputFormat.POSET;
    }

    /** Its size in a few words, like {@code 52 elements, 171 covers}. */
    default String size() {
        if (this instanceof OfPoset p) {
            return p.poset().size() + " elements, " + p.poset().coverCount() + " covers";
        }
        if (this instanceof OfFacets f) {
            return f.facets().vertexCount() + " vertices, " + f.facets().faceCount() + " facets";
        }
        VoxelSet voxels = ((OfVoxels) this).voxels();
        return voxels.count() + " of " + voxels.positions() + " voxels";
    }

    /**
     * Writes it, header first, then the comment line; does not close {@code out}. Voxels are
     * written as the face poset of their cubical complex, streaming.
     */
    default void write(Writer out) throws IOException {
        if (this instanceof OfVoxels v) {
            CubicalFacePoset.write(v.voxels(), out, description());
            return;
        }
        String text = this instanceof OfPoset p ? PosetWriter.toText(p.poset())
                : SimplicialWriter.toText(((OfFacets) this).facets());
        int headerEnd = text.indexOf('\n') + 1;
        out.write(text.substring(0, headerEnd) + "# " + description() + "\n" + text.substring(headerEnd));
    }

    /**
     * A poset.
     *
     * @param poset the poset
     * @param description what it is
     */
    record OfPoset(Poset poset, String description) implements Generated {
        /** Validates. */
        public OfPoset {
            Objects.requireNonNull(poset, "poset");
            Objects.requireNonNull(description, "description");
        }
    }

    /**
     * A simplicial complex by its facets.
     *
     * @param facets the listed faces
     * @param description what it is
     */
    record OfFacets(Facets facets, String description) implements Generated {
        /** Validates. */
        public OfFacets {
            Objects.requireNonNull(facets, "facets");
            Objects.requireNonNull(description, "description");
        }
    }

    /**
     * A set of voxels.
     *
     * @param voxels the voxels
     * @param description what it is
     */
    record OfVoxels(VoxelSet voxels, String description) implements Generated {
        /** Validates. */
        public OfVoxels {
            Objects.requireNonNull(voxels, "voxels");
            Objects.requireNonNull(description, "description");
        }
    }
}
