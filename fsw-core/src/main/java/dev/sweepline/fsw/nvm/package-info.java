/**
 * Host-side adapter for the flight software's non-volatile memory: the committed parameter table
 * image kept in a file (commands.md §4.3). Like {@code host}, this package may use the JDK's file
 * I/O; core packages see only {@link dev.sweepline.fsw.command.NonVolatileStore}.
 */
package dev.sweepline.fsw.nvm;
