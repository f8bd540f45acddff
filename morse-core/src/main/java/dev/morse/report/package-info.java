/**
 * The result of a homology run as an immutable value, and its renderings: a short text table for
 * people and one JSON object for programs.
 */
package dev.morse.report;
