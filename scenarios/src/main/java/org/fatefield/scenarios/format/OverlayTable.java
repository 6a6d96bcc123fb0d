package org.fatefield.scenarios.format;

import java.util.AbstractMap;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.tomlj.Toml;
import org.tomlj.TomlArray;
import org.tomlj.TomlPosition;
import org.tomlj.TomlTable;

/**
 * A read-only view of a parsed TOML table with {@link Overrides} laid over it: an overridden key
 * reads its new value (at the position of the key it replaces, so messages still point at the
 * file), everything else reads through. Nothing is copied and no text is written.
 */
final class OverlayTable implements TomlTable {

    private static final TomlTable EMPTY = Toml.parse("");

    private final TomlTable base;
    private final Overrides.Node node;

    OverlayTable(TomlTable base, Overrides.Node node) {
        this.base = base == null ? EMPTY : base;
        this.node = node;
    }

    private Object own(String key) {
        if (node.leaves.containsKey(key)) {
            return node.leaves.get(key);
        }
        Object value = base.get(List.of(key));
        Overrides.Node table = node.tables.get(key);
        if (table != null) {
            return new OverlayTable(value instanceof TomlTable t ? t : null, table);
        }
        Map<Integer, Overrides.Node> items = node.items.get(key);
        if (items != null && value instanceof TomlArray array) {
            return new OverlayArray(array, items);
        }
        return value;
    }

    @Override
    public Object get(List<String> path) {
        if (path.isEmpty()) {
            return this;
        }
        Object value = own(path.get(0));
        if (path.size() == 1) {
            return value;
        }
        return value instanceof TomlTable table ? table.get(path.subList(1, path.size())) : null;
    }

    @Override
    public TomlPosition inputPositionOf(List<String> path) {
        return base.inputPositionOf(path);
    }

    @Override
    public Set<String> keySet() {
        Set<String> keys = new LinkedHashSet<>(base.keySet());
        keys.addAll(node.leaves.keySet());
        keys.addAll(node.tables.keySet());
        return keys;
    }

    @Override
    public int size() {
        return keySet().size();
    }

    @Override
    public boolean isEmpty() {
        return keySet().isEmpty();
    }

    @Override
    public Set<Map.Entry<String, Object>> entrySet() {
        Set<Map.Entry<String, Object>> entries = new LinkedHashSet<>();
        for (String key : keySet()) {
            entries.add(new AbstractMap.SimpleImmutableEntry<>(key, own(key)));
        }
        return entries;
    }

    @Override
    public Set<List<String>> keyPathSet(boolean includeTables) {
        Set<List<String>> paths = new LinkedHashSet<>();
        for (Map.Entry<List<String>, Object> e : entryPathSet(includeTables)) {
            paths.add(e.getKey());
        }
        return paths;
    }

    @Override
    public Set<Map.Entry<List<String>, Object>> entryPathSet(boolean includeTables) {
        Set<Map.Entry<List<String>, Object>> entries = new LinkedHashSet<>();
        for (String key : keySet()) {
            Object value = own(key);
            if (value instanceof TomlTable table) {
                if (includeTables) {
                    entries.add(new AbstractMap.SimpleImmutableEntry<>(List.of(key), value));
                }
                for (Map.Entry<List<String>, Object> e : table.entryPathSet(includeTables)) {
                    List<String> path = new ArrayList<>();
                    path.add(key);
                    path.addAll(e.getKey());
                    entries.add(new AbstractMap.SimpleImmutableEntry<>(List.copyOf(path), e.getValue()));
                }
            } else {
                entries.add(new AbstractMap.SimpleImmutableEntry<>(List.of(key), value));
            }
        }
        return entries;
    }

    @Override
    public Map<String, Object> toMap() {
        Map<String, Object> map = new LinkedHashMap<>();
        for (String key : keySet()) {
            map.put(key, own(key));
        }
        return map;
    }

    /** An array of tables some of whose elements carry overrides. */
    private static final class OverlayArray implements TomlArray {

        private final TomlArray base;
        private final Map<Integer, Overrides.Node> items;

        OverlayArray(TomlArray base, Map<Integer, Overrides.Node> items) {
            this.base = base;
            this.items = items;
        }

        @Override
        public Object get(int index) {
            Overrides.Node item = items.get(index);
            Object value = base.get(index);
            return item != null && value instanceof TomlTable table ? new OverlayTable(table, item) : value;
        }

        @Override
        public TomlPosition inputPositionOf(int index) {
            return base.inputPositionOf(index);
        }

        @Override
        public List<Object> toList() {
            List<Object> list = new ArrayList<>();
            for (int i = 0; i < size(); i++) {
                list.add(get(i));
            }
            return list;
        }

        @Override
        public int size() {
            return base.size();
        }

        @Override
        public boolean isEmpty() {
            return base.isEmpty();
        }

        @Override
        public boolean containsStrings() {
            return base.containsStrings();
        }

        @Override
        public boolean containsLongs() {
            return base.containsLongs();
        }

        @Override
        public boolean containsDoubles() {
            return base.containsDoubles();
        }

        @Override
        public boolean containsBooleans() {
            return base.containsBooleans();
        }

        @Override
        public boolean containsOffsetDateTimes() {
            return base.containsOffsetDateTimes();
        }

        @Override
        public boolean containsLocalDateTimes() {
            return base.containsLocalDateTimes();
        }

        @Override
        public boolean containsLocalDates() {
            return base.containsLocalDates();
        }

        @Override
        public boolean containsLocalTimes() {
            return base.containsLocalTimes();
        }

        @Override
        public boolean containsArrays() {
            return base.containsArrays();
        }

        @Override
        public boolean containsTables() {
            return base.containsTables();
        }
    }
}
