package dev.morse.progress;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** A sink that keeps every phase begun, with its total and the largest count reported in it. */
final class PhaseRecorder implements Progress {
    /** One phase as reported. */
    record Phase(String name, String unit, long total, long largestCount) {
    }

    private final List<String> names = new ArrayList<>();
    private final List<String> units = new ArrayList<>();
    private final List<Long> totals = new ArrayList<>();
    private final List<Long> largest = new ArrayList<>();
    private final List<List<Long>> counts = new ArrayList<>();
    private long done;

    @Override
    public void begin(String phase, String unit, long total) {
        names.add(phase);
        units.add(unit);
        totals.add(total);
        largest.add(0L);
        counts.add(new ArrayList<>());
        done = 0;
    }

    @Override
    public void reached(long count) {
        done = count;
        note();
    }

    @Override
    public void advance(long delta) {
        done += delta;
        note();
    }

    private void note() {
        if (largest.isEmpty()) {
            throw new IllegalStateException("a count was reported before any phase began");
        }
        int last = largest.size() - 1;
        largest.set(last, Math.max(largest.get(last), done));
        counts.get(last).add(done);
    }

    /** The phases in the order begun; a phase begun twice appears twice. */
    List<Phase> phases() {
        List<Phase> out = new ArrayList<>();
        for (int i = 0; i < names.size(); i++) {
            out.add(new Phase(names.get(i), units.get(i), totals.get(i), largest.get(i)));
        }
        return out;
    }

    /** Every count reported in the first phase called {@code name}, in order. */
    List<Long> counts(String name) {
        return counts.get(names.indexOf(name));
    }

    /** The first phase of each name. */
    Map<String, Phase> byName() {
        Map<String, Phase> map = new LinkedHashMap<>();
        for (Phase p : phases()) {
            map.putIfAbsent(p.name(), p);
        }
        return map;
    }
}
