/**
 * YAML input files with located errors: a small tree of mappings, lists and scalars built from
 * Jackson's streaming YAML parser so that every value keeps its 1-based line and dotted path, and
 * {@link dev.sweepline.fsw.host.yaml.Section} to read a mapping with an allowed-key list, required fields
 * and typed values. Every problem is a {@link dev.sweepline.fsw.host.yaml.FileFormatException} naming the
 * file, the line and the field. Host side (it uses a library): instrument descriptions here, and
 * hw-sim's scenarios, campaigns and orbit plans.
 */
package dev.sweepline.fsw.host.yaml;
