package org.linemass.engine.pieces.join;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.linemass.engine.section.LayerJoin;
import org.linemass.geometry.Segment;

/**
 * Which segments may join: the join class of each segment's layer. Without rules every layer is its
 * own class, so only ends on one layer join; a {@link LayerJoin} puts all layers it matches in one
 * class (the first rule matching a layer wins). {@link #leadLayer} names the layer a piece spanning
 * several layers is reported on (see {@link LayerJoin}).
 */
public final class JoinClasses {

    private final List<LayerJoin> joins;
    private final Map<String, Integer> joinOfLayer = new HashMap<>();

    public JoinClasses(List<LayerJoin> joins) {
        this.joins = List.copyOf(joins);
    }

    /** The join class of every segment, numbered from 0. Not thread-safe (fills a cache). */
    public int[] classes(List<Segment> segments) {
        Map<String, Integer> ids = new HashMap<>();
        int[] out = new int[segments.size()];
        for (int i = 0; i < out.length; i++) {
            String layer = segments.get(i).source().layer();
            int j = join(layer);
            String key = j < 0 ? "layer:" + layer : "join:" + j;
            out[i] = ids.computeIfAbsent(key, k -> ids.size());
        }
        return out;
    }

    /** The index of the rule {@code layer} joins by, or -1. */
    private int join(String layer) {
        return joinOfLayer.computeIfAbsent(layer, l -> {
            for (int k = 0; k < joins.size(); k++) {
                if (joins.get(k).matches(l)) {
                    return k;
                }
            }
            return -1;
        });
    }

    /** The layers of {@code segments} in alphabetical order. */
    public static List<String> layers(List<Segment> segments) {
        java.util.TreeSet<String> names = new java.util.TreeSet<>();
        for (Segment s : segments) {
            names.add(s.source().layer());
        }
        return new ArrayList<>(names);
    }

    /**
     * The layer a piece of {@code segments} is reported on: its only layer; else the lead layer of the
     * rule it joined by when the piece spans it; else the layer with the longest run (ties: first in
     * alphabetical order).
     *
     * @param lengthOf the length of each segment
     */
    public String leadLayer(List<Segment> segments, java.util.function.ToDoubleFunction<Segment> lengthOf) {
        Map<String, Double> byLayer = new TreeMap<>();
        for (Segment s : segments) {
            byLayer.merge(s.source().layer(), lengthOf.applyAsDouble(s), Double::sum);
        }
        if (byLayer.size() == 1) {
            return byLayer.keySet().iterator().next();
        }
        int j = join(segments.get(0).source().layer());
        if (j >= 0 && joins.get(j).leadLayer() != null) {
            for (String l : byLayer.keySet()) {
                if (l.equalsIgnoreCase(joins.get(j).leadLayer())) {
                    return l;
                }
            }
        }
        return byLayer.entrySet().stream().max(Comparator.<Map.Entry<String, Double>>comparingDouble(Map.Entry::getValue)
                .thenComparing(Map.Entry::getKey, Comparator.reverseOrder())).orElseThrow().getKey();
    }

    /** The rule a layer joins by, or null. */
    public LayerJoin ruleOf(String layer) {
        int j = join(layer);
        return j < 0 ? null : joins.get(j);
    }
}
