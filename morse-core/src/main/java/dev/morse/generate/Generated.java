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
    /** The format it is written in. */
    InputFormat format();

    /** What it is, for the comment line and for people. */
    String description();

    /** Its size in a few words, like {@code 52 elements, 171 covers}. */
    String size();

    /** Writes it, header first, then the comment line; does not close {@code out}. */
    void write(Writer out) throws IOException;

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

        @Override
        public InputFormat format() {
            return InputFormat.POSET;
        }

        @Override
        public String size() {
            return poset.size() + " elements, " + poset.coverCount() + " covers";
        }

        @Override
        public void write(Writer out) throws IOException {
            out.write(withComment(PosetWriter.toText(poset), description));
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

        @Override
        public InputFormat format() {
            return InputFormat.SIMPLICIAL;
        }

        @Override
        public String size() {
            return facets.vertexCount() + " vertices, " + facets.faceCount() + " facets";
        }

        @Override
        public void write(Writer out) throws IOException {
            out.write(withComment(SimplicialWriter.toText(facets), description));
        }
    }

    /**
     * A set of voxels, written as the face poset of its cubical complex, streaming.
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

        @Override
        public InputFormat format() {
            return InputFormat.POSET;
        }

        @Override
        public String size() {
            return voxels.count() + " of " + voxels.positions() + " voxels";
        }

        @Override
        public void write(Writer out) throws IOException {
            CubicalFacePoset.write(voxels, out, description);
        }
    }

    /** Puts a comment line right after the header line of {@code text}. */
    private static String withComment(String text, String comment) {
        int headerEnd = text.indexOf('\n') + 1;
        return text.substring(0, headerEnd) + "# " + comment + "\n" + text.substring(headerEnd);
    }
}
