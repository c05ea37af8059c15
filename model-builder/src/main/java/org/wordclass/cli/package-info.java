/**
 * The {@code wordclass} command line: train, evaluate, cross-validate, tag, inspect, adapt,
 * learning curves, language packs and the demo. Output files are written through a temporary
 * file and a move ({@link org.wordclass.cli.CommandFiles}); bad input is reported naming the
 * file, line and problem ({@link org.wordclass.cli.Failures}).
 */
package org.wordclass.cli;
