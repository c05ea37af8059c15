/**
 * The demo: a small index of invented notices searched with and without word classes, and the
 * report that compares them.
 */
package org.wordclass.demo;
