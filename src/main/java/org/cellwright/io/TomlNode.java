package org.cellwright.io;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.tomlj.TomlArray;
import org.tomlj.TomlTable;

/**
 * A TOML document as a tree in which every key and value knows where it was written (file, line, column).
 * Built from tomlj's tree; tables are mutable so that {@code --set} values can be put in before the
 * scenario is resolved.
 */
sealed interface TomlNode permits TomlNode.Table, TomlNode.Leaf, TomlNode.Array {

    /** @return where the node's key (or, in an array, the element) was written */
    SourceLocation at();

    /** @return the kind of value, for messages ("a string", "a table") */
    String kind();

    /**
     * A scalar value.
     *
     * @param value a String, Long, Double, Boolean or a java.time value
     * @param at where its key was written
     * @param valueAt where the value's content begins (inside the quotes of a string)
     */
    record Leaf(Object value, SourceLocation at, SourceLocation valueAt) implements TomlNode {
        @Override
        public String kind() {
            if (value instanceof String) {
                return "a string";
            }
            if (value instanceof Long) {
                return "an integer";
            }
            if (value instanceof Double) {
                return "a number";
            }
            if (value instanceof Boolean) {
                return "a boolean";
            }
            return "a date or time";
        }

        /** @return the value as it might have been written, for messages */
        String text() {
            if (value instanceof Double d && !Double.isFinite(d)) {
                return d.isNaN() ? "nan" : d > 0 ? "inf" : "-inf";
            }
            return value instanceof String s ? s : String.valueOf(value);
        }
    }

    /**
     * An array of values or inline tables.
     *
     * @param items the elements in order
     * @param at where its key was written
     */
    record Array(List<TomlNode> items, SourceLocation at) implements TomlNode {
        public Array {
            items = List.copyOf(items);
        }

        @Override
        public String kind() {
            return "an array";
        }
    }

    /** A table: named entries in the order written. */
    final class Table implements TomlNode {
        private final Map<String, TomlNode> entries = new LinkedHashMap<>();
        private final SourceLocation at;

        Table(SourceLocation at) {
            this.at = at;
        }

        @Override
        public SourceLocation at() {
            return at;
        }

        @Override
        public String kind() {
            return "a table";
        }

        /** @return the entries, in the order written (read-only view) */
        Map<String, TomlNode> entries() {
            return Collections.unmodifiableMap(entries);
        }

        TomlNode get(String key) {
            return entries.get(key);
        }

        void put(String key, TomlNode node) {
            entries.put(key, node);
        }

        void remove(String key) {
            entries.remove(key);
        }
    }

    /**
     * Converts a tomlj table into a positioned tree.
     *
     * @param table tomlj's table
     * @param at where the table's key or header was written
     * @param src the parsed text
     * @return the tree
     */
    static Table of(TomlTable table, SourceLocation at, SourceText src) {
        Table out = new Table(at);
        for (String key : table.keySet()) {
            List<String> path = List.of(key);
            Object value = table.get(path);
            var pos = table.inputPositionOf(path);
            out.put(key, convert(value, src.at(pos), pos == null ? src.at(null) : src.valueStart(pos), src));
        }
        return out;
    }

    private static TomlNode convert(Object value, SourceLocation at, SourceLocation valueAt, SourceText src) {
        if (value instanceof TomlTable t) {
            return of(t, at, src);
        }
        if (value instanceof TomlArray a) {
            List<TomlNode> items = new ArrayList<>();
            for (int i = 0; i < a.size(); i++) {
                var pos = a.inputPositionOf(i);
                SourceLocation el = pos == null ? at : src.elementStart(pos);
                items.add(convert(a.get(i), el, el, src));
            }
            return new Array(items, at);
        }
        return new Leaf(value, at, valueAt);
    }
}
