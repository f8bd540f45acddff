package dev.morse.posetreduction;

import dev.morse.poset.Adjacency;
import dev.morse.poset.OrderCycleException;
import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import java.util.function.IntConsumer;

/**
 * The Hasse diagram of a poset from which elements are being removed one at a time, kept exact:
 * removing x deletes its covers and adds a cover {@code y ⋖ z} for each lower cover y and upper
 * cover z of x with nothing else between them. For {@code y ⋖ x ⋖ z}, the interval (y, z) of the
 * original poset holds some {@code w ≠ x} exactly when some other lower cover of z lies above y,
 * which one search of the smaller side decides. Heights of the original poset still increase
 * along every cover, so they bound the searches. Not thread-safe.
 *
 * <p>Memory: about 44 bytes per element (lists, flags, search stamps, stack and cursors) plus
 * about 16 bytes per cover, both directions.
 */
final class HasseWorkspace {
    private final Poset original;
    private final IntLists lower;
    private final IntLists upper;
    private final boolean[] removed;
    private final int[] stamp;
    private final int[] stack;
    private final int[] cursor;
    private final int[] target;
    private int epoch;
    private int alive;
    private int minimal;
    private int maximal;

    HasseWorkspace(Poset poset) {
        original = poset;
        int n = poset.size();
        lower = copy(poset.lowerCovers());
        upper = copy(poset.upperCovers());
        removed = new boolean[n];
        stamp = new int[n];
        stack = new int[n];
        cursor = new int[n];
        target = new int[n];
        alive = n;
        for (int x = 0; x < n; x++) {
            if (lower.size(x) == 0) {
                minimal++;
            }
            if (upper.size(x) == 0) {
                maximal++;
            }
        }
    }

    private static IntLists copy(Adjacency covers) {
        int n = covers.vertexCount();
        IntLists lists = new IntLists(n, covers.edgeCount() + 16);
        for (int x = 0; x < n; x++) {
            lists.reserve(x, covers.degree(x));
            for (int i = covers.start(x); i < covers.end(x); i++) {
                lists.add(x, covers.target(i));
            }
        }
        return lists;
    }

    int size() {
        return removed.length;
    }

    boolean isAlive(int x) {
        return !removed[x];
    }

    int aliveCount() {
        return alive;
    }

    int minimalCount() {
        return minimal;
    }

    int maximalCount() {
        return maximal;
    }

    /** The height of x in the original poset: it still increases along every cover. */
    int height(int x) {
        return original.height(x);
    }

    int lowerCount(int x) {
        return lower.size(x);
    }

    int upperCount(int x) {
        return upper.size(x);
    }

    int lower(int x, int i) {
        return lower.get(x, i);
    }

    int upper(int x, int i) {
        return upper.get(x, i);
    }

    /** Whether x covers exactly one element or is covered by exactly one (Stong 1966). */
    boolean isBeatPoint(int x) {
        return lower.size(x) == 1 || upper.size(x) == 1;
    }

    /**
     * Removes {@code x}, keeping the covers exact, and passes every element whose covers changed
     * to {@code touched}.
     */
    void remove(int x, IntConsumer touched) {
        int[] below = lower.toArray(x);
        int[] above = upper.toArray(x);
        for (int y : below) {
            upper.remove(y, x);
        }
        for (int z : above) {
            lower.remove(z, x);
        }
        lower.clear(x);
        upper.clear(x);
        removed[x] = true;
        alive--;
        if (below.length > 0 && above.length > 0) {
            if (below.length <= above.length) {
                bridgeFromBelow(below, above);
            } else {
                bridgeFromAbove(below, above);
            }
        }
        if (below.length == 0) {
            minimal--;
            for (int z : above) {
                if (lower.size(z) == 0) {
                    minimal++;
                }
            }
        }
        if (above.length == 0) {
            maximal--;
            for (int y : below) {
                if (upper.size(y) == 0) {
                    maximal++;
                }
            }
        }
        for (int y : below) {
            touched.accept(y);
        }
        for (int z : above) {
            touched.accept(z);
        }
    }

    /**
     * For each y below: searches upward from y (below the highest z) until every z is found to have a
     * lower cover strictly above y, then links y to the z not found. The search goes depth first and
     * stops as soon as all are found, so removing one of many parallel elements (one bottom, 10^5
     * atoms, one top) costs a step or two, not a walk over all the others.
     */
    private void bridgeFromBelow(int[] below, int[] above) {
        int ceiling = 0;
        for (int z : above) {
            ceiling = Math.max(ceiling, original.height(z));
        }
        for (int y : below) {
            int mark = ++epoch;
            for (int z : above) {
                target[z] = mark;
            }
            int missing = above.length;
            int top = 0;
            stack[top] = y;
            cursor[top++] = 0;
            while (top > 0 && missing > 0) {
                int v = stack[top - 1];
                if (cursor[top - 1] == upper.size(v)) {
                    top--;
                    continue;
                }
                int w = upper.get(v, cursor[top - 1]++);
                if (v != y && target[w] == mark) {
                    // v lies strictly between y and w: w is no new cover of y
                    target[w] = -mark;
                    missing--;
                }
                if (stamp[w] != mark && original.height(w) < ceiling) {
                    stamp[w] = mark;
                    stack[top] = w;
                    cursor[top++] = 0;
                }
            }
            for (int z : above) {
                if (target[z] == mark) {
                    link(y, z);
                }
            }
        }
    }

    /** For each z above: marks everything below its other lower covers (above the lowest y), then links the y not reached. */
    private void bridgeFromAbove(int[] below, int[] above) {
        int floor = Integer.MAX_VALUE;
        for (int y : below) {
            floor = Math.min(floor, original.height(y));
        }
        for (int z : above) {
            int mark = ++epoch;
            int top = 0;
            for (int i = 0; i < lower.size(z); i++) {
                int w = lower.get(z, i);
                if (original.height(w) > floor) {
                    stack[top++] = w;
                }
            }
            while (top > 0) {
                int v = stack[--top];
                for (int i = 0; i < lower.size(v); i++) {
                    int w = lower.get(v, i);
                    if (stamp[w] != mark && original.height(w) >= floor) {
                        stamp[w] = mark;
                        if (original.height(w) > floor) {
                            stack[top++] = w;
                        }
                    }
                }
            }
            for (int y : below) {
                if (stamp[y] != mark) {
                    link(y, z);
                }
            }
        }
    }

    private void link(int y, int z) {
        lower.add(z, y);
        upper.add(y, z);
    }

    /**
     * The elements strictly below ({@code down}) or above {@code x}, or null when there are more
     * than {@code cap}.
     */
    int[] collect(int x, boolean down, int cap) {
        IntLists edges = down ? lower : upper;
        int mark = ++epoch;
        int[] found = new int[Math.min(cap, alive)];
        int count = 0;
        int top = 0;
        stack[top++] = x;
        while (top > 0) {
            int v = stack[--top];
            for (int i = 0; i < edges.size(v); i++) {
                int w = edges.get(v, i);
                if (stamp[w] != mark) {
                    if (count == found.length) {
                        return null;
                    }
                    stamp[w] = mark;
                    found[count++] = w;
                    stack[top++] = w;
                }
            }
        }
        return java.util.Arrays.copyOf(found, count);
    }

    /** The poset of the elements left, with their labels, in their original order. */
    Poset toPoset() {
        PosetBuilder builder = new PosetBuilder();
        int[] id = new int[removed.length];
        for (int x = 0; x < removed.length; x++) {
            id[x] = removed[x] ? -1 : builder.element(original.label(x));
        }
        for (int x = 0; x < removed.length; x++) {
            if (!removed[x]) {
                for (int i = 0; i < lower.size(x); i++) {
                    builder.relate(id[lower.get(x, i)], id[x], 0);
                }
            }
        }
        try {
            return builder.build();
        } catch (OrderCycleException e) {
            throw new IllegalStateException("covers of a subposet cannot form a cycle", e);
        }
    }
}
