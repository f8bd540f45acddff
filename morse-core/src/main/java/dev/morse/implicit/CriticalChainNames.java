package dev.morse.implicit;

import dev.morse.poset.Poset;
import java.util.ArrayList;
import java.util.List;

/**
 * The critical chains of an implicit run, named on demand by their elements' labels from the bottom
 * up joined by {@code <}, as the stored order complex names its chains. Holds the chains and the
 * bounded poset the run kept; names are built only when asked for.
 */
public final class CriticalChainNames {
    private final CriticalChains chains;
    private final Poset poset;
    private final int[] originalOf;

    /** Keeps the chains and the renumbering, not the bounded poset's down-sets, which are large. */
    CriticalChainNames(CriticalChains chains, BoundedPoset bounded) {
        this.chains = chains;
        this.poset = bounded.poset();
        this.originalOf = new int[poset.size()];
        for (int x = 0; x < originalOf.length; x++) {
            originalOf[x] = bounded.original(x);
        }
    }

    /** The critical chains themselves, in internal ids. */
    CriticalChains chains() {
        return chains;
    }

    /** The names of the critical chains of dimension {@code d}, in the order of the Morse complex. */
    public List<String> names(int d) {
        int count = chains.count(d);
        List<String> names = new ArrayList<>(count);
        int[] chain = new int[d + 1];
        for (int k = 0; k < count; k++) {
            chains.copy(d, k, chain);
            StringBuilder name = new StringBuilder();
            for (int i = 0; i <= d; i++) {
                if (i > 0) {
                    name.append('<');
                }
                name.append(poset.label(originalOf[chain[i]]));
            }
            names.add(name.toString());
        }
        return names;
    }
}
