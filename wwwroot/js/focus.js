// Focuses the first element among the given ids that is on the page (scrolled into view), and returns its id or null.
export function focusFirst(ids) {
    for (const id of ids) {
        const element = document.getElementById(id);
        if (element) {
            element.scrollIntoView({ block: "center" });
            element.focus({ preventScroll: true });
            return id;
        }
    }
    return null;
}
