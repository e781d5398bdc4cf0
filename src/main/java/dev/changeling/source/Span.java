package dev.changeling.source;

/** A half-open range {@code [begin, end)} of UTF-16 offsets into a file's text. */
public record Span(int begin, int end) implements Comparable<Span> {

    public Span {
        if (begin < 0 || end < begin) {
            throw new IllegalArgumentException("bad span [" + begin + ", " + end + ")");
        }
    }

    public int length() {
        return end - begin;
    }

    public boolean contains(Span other) {
        return begin <= other.begin && other.end <= end;
    }

    public boolean overlaps(Span other) {
        return begin < other.end && other.begin < end;
    }

    public boolean contains(int offset) {
        return begin <= offset && offset < end;
    }

    @Override
    public int compareTo(Span other) {
        return begin != other.begin ? Integer.compare(begin, other.begin) : Integer.compare(other.end, end);
    }
}
