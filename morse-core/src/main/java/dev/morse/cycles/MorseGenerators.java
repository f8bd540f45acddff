package dev.morse.cycles;

import dev.morse.homology.Coefficients;
import dev.morse.homology.SparseIntegerMatrix;
import dev.morse.morsecomplex.MorseComplex;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;

/**
 * Generators of the homology of a Morse complex, dimension by dimension, as integer vectors over
 * its critical cells. Over Z: with {@code U A V = D} the Smith form of {@code ∂_d}, the last
 * columns of {@code V} are a basis K of the d-cycles; the boundaries {@code ∂_(d+1)} written in
 * that basis form a matrix X, and with {@code P X Q = E} its Smith form, the columns of
 * {@code K P⁻¹} are generators of H_d: of order {@code e_i} where {@code e_i > 1}, free beyond the
 * rank of X, trivial where {@code e_i = 1} (the structure theorem for finitely generated abelian
 * groups; e.g. Munkres, Elements of Algebraic Topology, 1984, §11). Over Q the free ones span.
 * Over Z/p also the torsion generators of order divisible by p, and for each torsion generator z
 * of H_(d-1) of order t with p | t, the chain y with {@code ∂y = t z}, a cycle modulo p (the
 * universal coefficient theorem).
 *
 * <p>Beside each generator comes a cocycle that certifies it (the certificates of a certifying
 * algorithm: McConnell, Mehlhorn, Näher and Schweitzer, "Certifying algorithms", Computer Science
 * Review 5, 2011): row i of {@code P} applied to the kernel coordinates ({@code V⁻¹ x}, its last k
 * entries) is a linear form ψ_i with {@code ψ_i(z_j) = δ_ij}, and {@code ψ_i ∂_(d+1) = e_i (Q⁻¹)_i},
 * so ψ_i is a cocycle over Z for a free generator and modulo t for one of order t. For a generator
 * y of H_d(Z/p) that comes from torsion of order t in dimension d − 1, {@code ψ ∘ ∂_d / t} is an
 * integer cocycle taking the value 1 on y. Torsion generators over Z also carry their preimage:
 * {@code ∂_(d+1) y = t z}.
 */
final class MorseGenerators {
    /**
     * One generator: its order (0 when free) and its coefficients over the critical cells of its
     * dimension; a cocycle over the same cells taking the value 1 on it and 0 on the other generators
     * of its dimension (modulo the order for a torsion generator), and for a torsion generator over Z
     * its preimage over the critical cells of the dimension above (else {@code null}).
     */
    record Generator(int dimension, BigInteger order, BigInteger[] coefficients, BigInteger[] cocycle,
            BigInteger[] preimage) {
    }

    /** The per-dimension decomposition kept for the next dimension's Tor part. */
    private record Cycles(BigInteger[][] generators, BigInteger[] orders, BigInteger[][] preimages,
            BigInteger[][] cocycles) {
    }

    private MorseGenerators() {
    }

    /**
     * Generators of every homology group of {@code morse} over {@code coefficients}, in the order of
     * the groups: per dimension the free ones first, then the torsion ones by ascending order (over
     * Z); over a field every generator has order 0.
     */
    static List<Generator> of(MorseComplex morse, Coefficients coefficients) {
        List<Generator> all = new ArrayList<>();
        Cycles below = null;
        for (int d = 0; d <= morse.dimension(); d++) {
            Cycles here = cycles(morse, d);
            List<Generator> free = new ArrayList<>();
            List<Generator> torsion = new ArrayList<>();
            for (int i = 0; i < here.orders().length; i++) {
                BigInteger t = here.orders()[i];
                if (t.signum() == 0) {
                    free.add(new Generator(d, BigInteger.ZERO, here.generators()[i], here.cocycles()[i], null));
                } else if (!t.equals(BigInteger.ONE)) {
                    torsion.add(new Generator(d, t, here.generators()[i], here.cocycles()[i], here.preimages()[i]));
                }
            }
            all.addAll(free);
            switch (coefficients.ring()) {
                case INTEGERS -> all.addAll(torsion);
                case RATIONALS -> { }
                case PRIME_FIELD -> {
                    BigInteger p = BigInteger.valueOf(coefficients.prime());
                    for (Generator g : torsion) {
                        if (g.order().mod(p).signum() == 0) {
                            all.add(new Generator(d, BigInteger.ZERO, g.coefficients(), g.cocycle(), null));
                        }
                    }
                    if (below != null) {
                        for (int i = 0; i < below.orders().length; i++) {
                            BigInteger t = below.orders()[i];
                            if (t.signum() > 0 && !t.equals(BigInteger.ONE) && t.mod(p).signum() == 0) {
                                all.add(new Generator(d, BigInteger.ZERO, below.preimages()[i],
                                        bocksteinCocycle(morse, d, below.cocycles()[i], t), null));
                            }
                        }
                    }
                }
            }
            below = here;
        }
        return all;
    }

    /** The cycle basis K·P⁻¹ of dimension d, the order of each, and preimages under ∂_(d+1) of the torsion ones. */
    private static Cycles cycles(MorseComplex morse, int d) {
        int n = morse.cellCount(d);
        SmithTransforms a = SmithTransforms.of(dense(d == 0 ? null : morse.boundary(d), morse.cellCount(d - 1), n),
                morse.cellCount(d - 1), n);
        int k = n - a.rank();
        BigInteger[][] kernel = new BigInteger[k][];
        for (int j = 0; j < k; j++) {
            kernel[j] = a.vColumn(a.rank() + j);
        }
        int above = d < morse.dimension() ? morse.cellCount(d + 1) : 0;
        BigInteger[][] b = dense(above == 0 ? null : morse.boundary(d + 1), n, above);
        BigInteger[][] x = new BigInteger[k][above];
        for (int c = 0; c < above; c++) {
            BigInteger[] column = new BigInteger[n];
            for (int i = 0; i < n; i++) {
                column[i] = b[i][c];
            }
            BigInteger[] coordinates = a.vInverseTimes(column);
            for (int j = 0; j < k; j++) {
                x[j][c] = coordinates[a.rank() + j];
            }
        }
        SmithTransforms s = SmithTransforms.of(x, k, above);
        BigInteger[][] generators = new BigInteger[k][];
        BigInteger[] orders = new BigInteger[k];
        BigInteger[][] preimages = new BigInteger[k][];
        BigInteger[][] cocycles = new BigInteger[k][];
        BigInteger[][] kernelForms = new BigInteger[k][];
        for (int j = 0; j < k; j++) {
            kernelForms[j] = a.vInverseRow(a.rank() + j);
        }
        for (int i = 0; i < k; i++) {
            BigInteger[] row = s.uRow(i);
            BigInteger[] psi = new BigInteger[n];
            java.util.Arrays.fill(psi, BigInteger.ZERO);
            for (int j = 0; j < k; j++) {
                if (row[j].signum() != 0) {
                    for (int c = 0; c < n; c++) {
                        psi[c] = psi[c].add(row[j].multiply(kernelForms[j][c]));
                    }
                }
            }
            cocycles[i] = psi;
            BigInteger[] combination = s.uInverseColumn(i);
            BigInteger[] z = new BigInteger[n];
            for (int r = 0; r < n; r++) {
                BigInteger sum = BigInteger.ZERO;
                for (int j = 0; j < k; j++) {
                    if (combination[j].signum() != 0) {
                        sum = sum.add(kernel[j][r].multiply(combination[j]));
                    }
                }
                z[r] = sum;
            }
            generators[i] = z;
            orders[i] = i < s.rank() ? s.diagonal(i) : BigInteger.ZERO;
            preimages[i] = i < s.rank() ? s.vColumn(i) : null; // ∂_(d+1) of it is orders[i]·z
        }
        return new Cycles(generators, orders, preimages, cocycles);
    }

    /** {@code ψ ∘ ∂_d / t} over the critical cells of dimension d, for ψ a cocycle modulo t in dimension d − 1. */
    private static BigInteger[] bocksteinCocycle(MorseComplex morse, int d, BigInteger[] psi, BigInteger t) {
        SparseIntegerMatrix b = morse.boundary(d);
        BigInteger[] eta = new BigInteger[morse.cellCount(d)];
        for (int j = 0; j < eta.length; j++) {
            BigInteger sum = BigInteger.ZERO;
            for (int i = b.start(j); i < b.end(j); i++) {
                sum = sum.add(psi[b.row(i)].multiply(BigInteger.valueOf(b.value(i))));
            }
            BigInteger[] qr = sum.divideAndRemainder(t);
            if (qr[1].signum() != 0) {
                throw new IllegalStateException("a torsion cocycle of the Morse complex is not a cocycle modulo its order");
            }
            eta[j] = qr[0];
        }
        return eta;
    }

    private static BigInteger[][] dense(SparseIntegerMatrix m, int rows, int columns) {
        BigInteger[][] a = new BigInteger[rows][columns];
        for (BigInteger[] row : a) {
            java.util.Arrays.fill(row, BigInteger.ZERO);
        }
        if (m != null) {
            for (int j = 0; j < columns; j++) {
                for (int i = m.start(j); i < m.end(j); i++) {
                    a[m.row(i)][j] = BigInteger.valueOf(m.value(i));
                }
            }
        }
        return a;
    }
}
