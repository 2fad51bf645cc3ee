// IndexedDB for the client unit tests: jsdom has none, and the field app keeps its work in it.
import 'fake-indexeddb/auto';
