/**
 * Turning results into text and JSON for people and programs.
 */
package dev.morse.report;
