package org.scalewright.cli;

import java.util.concurrent.Callable;
import picocli.CommandLine.Mixin;

/** A command that works on one scale sheet: the sheet, {@code --a4} and {@code --strength} ({@link Inputs}). */
abstract class ScaleCommand implements Callable<Integer> {
    @Mixin
    Inputs inputs;
}
