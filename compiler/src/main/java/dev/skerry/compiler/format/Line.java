package dev.skerry.compiler.format;

/**
 * One output line before rendering: its indentation in spaces, its code (or, for a comment on a
 * line of its own, the comment), an optional trailing line comment, and whether a blank line
 * precedes it.
 */
final class Line {
  final int indent;
  final boolean blankBefore;
  final boolean commentOnly;
  final StringBuilder code = new StringBuilder();
  String trailing;
  /** True while the last code on this line is a block's opening brace. */
  boolean opensBlock;

  Line(int indent, boolean blankBefore, boolean commentOnly) {
    this.indent = indent;
    this.blankBefore = blankBefore;
    this.commentOnly = commentOnly;
  }

  boolean isEmpty() {
    return code.length() == 0;
  }

  int width() {
    return indent + code.length();
  }

  /** A line whose trailing comment may line up with its neighbours'. */
  boolean alignable() {
    return !commentOnly && code.indexOf("\n") < 0;
  }
}
