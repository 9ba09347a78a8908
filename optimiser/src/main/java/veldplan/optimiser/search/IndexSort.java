package veldplan.optimiser.search;

/**
 * A stable sort of an index array by a parallel array of double keys, without boxing
 * (insertion sort for short runs, merge sort above).
 */
final class IndexSort {
  private static final int INSERTION_LIMIT = 24;

  private IndexSort() {}

  /**
   * Sorts {@code index[0..size)} and {@code keys[0..size)} together by ascending key; equal keys
   * keep their order. NaN keys are not allowed.
   */
  static void sort(int[] index, double[] keys, int size) {
    if (size <= INSERTION_LIMIT) {
      insertion(index, keys, 0, size);
      return;
    }
    int[] indexBuffer = new int[size];
    double[] keyBuffer = new double[size];
    mergeSort(index, keys, indexBuffer, keyBuffer, 0, size);
  }

  private static void insertion(int[] index, double[] keys, int from, int to) {
    for (int i = from + 1; i < to; i++) {
      double key = keys[i];
      int value = index[i];
      int j = i - 1;
      while (j >= from && keys[j] > key) {
        keys[j + 1] = keys[j];
        index[j + 1] = index[j];
        j--;
      }
      keys[j + 1] = key;
      index[j + 1] = value;
    }
  }

  private static void mergeSort(int[] index, double[] keys, int[] indexBuffer,
      double[] keyBuffer, int from, int to) {
    if (to - from <= INSERTION_LIMIT) {
      insertion(index, keys, from, to);
      return;
    }
    int mid = (from + to) >>> 1;
    mergeSort(index, keys, indexBuffer, keyBuffer, from, mid);
    mergeSort(index, keys, indexBuffer, keyBuffer, mid, to);
    if (keys[mid - 1] <= keys[mid]) {
      return;
    }
    System.arraycopy(index, from, indexBuffer, from, to - from);
    System.arraycopy(keys, from, keyBuffer, from, to - from);
    int i = from;
    int j = mid;
    for (int k = from; k < to; k++) {
      if (j >= to || (i < mid && keyBuffer[i] <= keyBuffer[j])) {
        index[k] = indexBuffer[i];
        keys[k] = keyBuffer[i++];
      } else {
        index[k] = indexBuffer[j];
        keys[k] = keyBuffer[j++];
      }
    }
  }
}
