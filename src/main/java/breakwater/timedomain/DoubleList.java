package breakwater.timedomain;

import java.util.Arrays;

/** A growable array of primitive doubles. */
final class DoubleList {

    private double[] a;
    private int size;

    DoubleList(int capacity) {
        a = new double[Math.max(4, capacity)];
    }

    void add(double v) {
        if (size == a.length) {
            a = Arrays.copyOf(a, a.length * 2);
        }
        a[size++] = v;
    }

    int size() {
        return size;
    }

    double get(int i) {
        return a[i];
    }

    double last() {
        return a[size - 1];
    }

    void clear() {
        size = 0;
    }

    double[] toArray() {
        return Arrays.copyOf(a, size);
    }
}
