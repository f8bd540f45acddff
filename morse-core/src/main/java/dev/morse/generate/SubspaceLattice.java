package dev.morse.generate;

import dev.morse.poset.PosetOperations;

import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import it.unimi.dsi.fastutil.objects.Object2IntOpenHashMap;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.List;

/**
 * The subspaces of {@code F_q^n} for a prime power q, ordered by inclusion. Each subspace is held
 * as its basis in reduced row echelon form, which is unique, and labelled by it: rows as digit
 * strings inside angle brackets, like {@code <100,011>}; the zero subspace is {@code <>}. For
 * {@code q > 10} the entries of a row are separated by dots. The elements of {@code F_q} are
 * written as the numbers {@code 0..q-1} of {@link FiniteField}. A subspace is covered by the spans of
 * it and one vector outside it. There are {@code Σ_k [n choose k]_q} subspaces (Gaussian
 * binomials), and by the Solomon–Tits theorem the proper part is a wedge of {@code q^C(n,2)}
 * spheres {@code S^(n-2)}.
 */
public final class SubspaceLattice {
    /** Largest number of vectors {@code q^n} accepted. */
    public static final int MAX_VECTORS = 1 << 16;

    private SubspaceLattice() {
    }

    /** All subspaces of {@code F_q^n}, {@code n ≥ 1}, q a prime power. */
    public static Poset lattice(int q, int n) {
        check(q, n);
        FiniteField field = FiniteField.of(q);
        int vectors = 1;
        for (int i = 0; i < n; i++) {
            vectors *= q;
        }
        PosetBuilder b = new PosetBuilder();
        Object2IntOpenHashMap<String> ids = new Object2IntOpenHashMap<>();
        List<int[][]> bases = new ArrayList<>();
        ArrayDeque<Integer> queue = new ArrayDeque<>();
        int[][] zero = new int[0][];
        ids.put(label(zero, q), b.element(label(zero, q)));
        bases.add(zero);
        queue.add(0);
        while (!queue.isEmpty()) {
            int id = queue.poll();
            int[][] basis = bases.get(id);
            for (int code = 1; code < vectors; code++) {
                int[] v = reduce(vector(code, q, n), basis, field);
                if (isZero(v)) {
                    continue;
                }
                int[][] bigger = rowReduce(append(basis, v), field);
                String name = label(bigger, q);
                int upper;
                if (ids.containsKey(name)) {
                    upper = ids.getInt(name);
                } else {
                    upper = b.element(name);
                    ids.put(name, upper);
                    bases.add(bigger);
                    queue.add(upper);
                }
                b.relate(id, upper, 0);
            }
        }
        return b.buildKnownAcyclic();
    }

    /** The proper part: subspaces other than 0 and {@code F_q^n}. */
    public static Poset properPart(int q, int n) {
        return PosetOperations.properPart(lattice(q, n));
    }

    private static void check(int q, int n) {
        if (q < 2 || q > FiniteField.MAX_ORDER || !isPrimePower(q)) {
            throw new IllegalArgumentException("q must be a prime power in 2.." + FiniteField.MAX_ORDER + ", got " + q);
        }
        if (n < 1) {
            throw new IllegalArgumentException("n must be positive, got " + n);
        }
        long vectors = 1;
        for (int i = 0; i < n; i++) {
            vectors *= q;
            if (vectors > MAX_VECTORS) {
                throw new IllegalArgumentException("q^n exceeds " + MAX_VECTORS);
            }
        }
    }

    private static boolean isPrimePower(int q) {
        int p = 2;
        while (q % p != 0) {
            p++;
        }
        while (q % p == 0) {
            q /= p;
        }
        return q == 1;
    }

    private static int[] vector(int code, int q, int n) {
        int[] v = new int[n];
        for (int i = n - 1; i >= 0; i--) {
            v[i] = code % q;
            code /= q;
        }
        return v;
    }

    private static boolean isZero(int[] v) {
        for (int x : v) {
            if (x != 0) {
                return false;
            }
        }
        return true;
    }

    private static int pivot(int[] row) {
        for (int i = 0; i < row.length; i++) {
            if (row[i] != 0) {
                return i;
            }
        }
        return -1;
    }

    /** {@code v} minus its components along the pivots of an echelon basis. */
    private static int[] reduce(int[] v, int[][] basis, FiniteField f) {
        int[] r = v.clone();
        for (int[] row : basis) {
            int p = pivot(row);
            int factor = r[p];
            if (factor != 0) {
                for (int i = 0; i < r.length; i++) {
                    r[i] = f.minus(r[i], f.times(factor, row[i]));
                }
            }
        }
        return r;
    }

    private static int[][] append(int[][] basis, int[] v) {
        int[][] rows = new int[basis.length + 1][];
        for (int i = 0; i < basis.length; i++) {
            rows[i] = basis[i].clone();
        }
        rows[basis.length] = v.clone();
        return rows;
    }

    /** Gauss–Jordan elimination over F_q of linearly independent rows. */
    private static int[][] rowReduce(int[][] rows, FiniteField f) {
        int n = rows[0].length;
        int rank = 0;
        for (int col = 0; col < n && rank < rows.length; col++) {
            int found = -1;
            for (int r = rank; r < rows.length && found < 0; r++) {
                if (rows[r][col] != 0) {
                    found = r;
                }
            }
            if (found < 0) {
                continue;
            }
            int[] swap = rows[rank];
            rows[rank] = rows[found];
            rows[found] = swap;
            int inverse = f.inverse(rows[rank][col]);
            for (int i = 0; i < n; i++) {
                rows[rank][i] = f.times(rows[rank][i], inverse);
            }
            for (int r = 0; r < rows.length; r++) {
                int factor = rows[r][col];
                if (r != rank && factor != 0) {
                    for (int i = 0; i < n; i++) {
                        rows[r][i] = f.minus(rows[r][i], f.times(factor, rows[rank][i]));
                    }
                }
            }
            rank++;
        }
        if (rank != rows.length) {
            throw new IllegalStateException("rows were not independent");
        }
        return rows;
    }

    private static String label(int[][] basis, int q) {
        StringBuilder s = new StringBuilder("<");
        for (int r = 0; r < basis.length; r++) {
            if (r > 0) {
                s.append(',');
            }
            for (int i = 0; i < basis[r].length; i++) {
                if (i > 0 && q > 10) {
                    s.append('.');
                }
                s.append(basis[r][i]);
            }
        }
        return s.append('>').toString();
    }
}
