package org.cellwright.ui;

import org.cellwright.io.Dimension;

/**
 * One field of the scenario form: the scenario-file key it edits, its caption, the dimension its value must
 * have (null for text, names and lists), whether it may be left empty, and the tooltip (units, range,
 * source of defaults).
 *
 * @param key the dotted key in the scenario file ("cell.gap"); "supply.value" stands for whichever of
 *     current, current_density or voltage the supply sets
 * @param label the caption beside the field
 * @param dimension the dimension the value must have, or null
 * @param required true when the file must give it
 * @param example a typical value, shown greyed in an empty field
 * @param tooltip what the value is, its units and where defaults come from
 */
record FieldSpec(String key, String label, Dimension dimension, boolean required, String example, String tooltip) {
}
