// Per-browser preferences of Winding (unit system, colours), kept in localStorage. Without storage (private windows,
// storage switched off) reads give null and writes are dropped: the choice then lasts for the visit only.
export function read(key) {
    try {
        return window.localStorage.getItem(key);
    } catch {
        return null;
    }
}

export function write(key, value) {
    try {
        window.localStorage.setItem(key, value);
    } catch {
        // Storage is unavailable; nothing else to do.
    }
}
