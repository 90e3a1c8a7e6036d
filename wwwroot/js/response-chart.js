// Draws the frequency-response plot (Display/ResponsePlot.cs, sent as JSON) with uPlot into a container element.
// The uPlot instance lives on the element and is updated in place (setData); it is built anew only when the series
// layout (names, colours, styles, axes) changes. Shaded ranges and edge lines are drawn in uPlot's drawClear/draw hooks.
// After every draw the container's data-drawn counter goes up and a "winding-chart-drawn" event is dispatched on it;
// element.windingChart holds the plotted values ({ x, series: [{ name, values }] }) for tests.
import uPlot from "../lib/uplot/uPlot.esm.js";

const HEIGHT = 380;
const GRID = "rgba(128, 128, 128, 0.25)";
const DASHES = { solid: undefined, dash: [6, 4], dot: [2, 3] };
const PREFIXES = [[1e9, "G"], [1e6, "M"], [1e3, "k"], [1, ""]];

// A frequency with an SI prefix, e.g. 7.348 MHz (significant digits given).
function hertz(value, digits) {
    if (value == null || !Number.isFinite(value)) {
        return "—";
    }

    const [scale, prefix] = PREFIXES.find(([s]) => Math.abs(value) >= s) ?? [1, ""];
    return `${Number((value / scale).toPrecision(digits))} ${prefix}Hz`;
}

// Log-axis ticks: 1…9 × each power of ten within the range (uPlot's log filter then labels 1, 2, 5… as room allows).
function decadeSplits(u, axisIdx, min, max) {
    const splits = [];
    if (!(min > 0) || !(max > min)) {
        return splits;
    }

    for (let e = Math.floor(Math.log10(min)); e <= Math.ceil(Math.log10(max)); e++) {
        for (let m = 1; m < 10; m++) {
            const v = Number((m * 10 ** e).toPrecision(12));
            if (v >= min * (1 - 1e-9) && v <= max * (1 + 1e-9)) {
                splits.push(v);
            }
        }
    }

    return splits;
}

// The chart's text colour follows the page (light or dark theme); black on paper.
let printing = false;
const textColour = u => printing ? "#000" : getComputedStyle(u.root).color || "#444";

// Every chart on the page, to redraw them for printing.
const charts = new Set();

function redrawAll() {
    for (const state of charts) {
        state.plot?.redraw(false, false);
    }
}

function watchPrinting() {
    if (watchPrinting.done || typeof window === "undefined") {
        return;
    }

    watchPrinting.done = true;
    window.addEventListener("beforeprint", () => { printing = true; redrawAll(); });
    window.addEventListener("afterprint", () => { printing = false; redrawAll(); });
}

// Range that starts at zero when all values are on one side of it, with a little room above.
function toZero(u, min, max) {
    if (min == null || max == null || !Number.isFinite(min) || !Number.isFinite(max)) {
        return [0, 1];
    }

    const lo = Math.min(0, min);
    const hi = Math.max(0, max);
    const span = hi - lo || 1;
    return [lo === 0 ? 0 : lo - 0.05 * span, hi === 0 ? 0 : hi + 0.05 * span];
}

function layoutKey(spec) {
    return JSON.stringify([spec.frequencyTitle, spec.leftTitle, spec.rightTitle,
        spec.series.map(s => [s.name, s.colour, s.width, s.dash, s.axis, s.unit, s.decimals, s.spansGaps])]);
}

function data(spec) {
    return [spec.frequenciesHz, ...spec.series.map(s => s.values)];
}

// Shaded ranges across the plot height, under the lines.
function drawSpans(u, state) {
    const spec = state.spec;
    const { ctx } = u;
    const { left, top, width, height } = u.bbox;
    ctx.save();
    ctx.beginPath();
    ctx.rect(left, top, width, height);
    ctx.clip();
    for (const span of [spec.band, ...spec.spreads]) {
        const x0 = u.valToPos(span.fromHz, "x", true);
        const x1 = u.valToPos(span.toHz, "x", true);
        ctx.fillStyle = span.fill;
        ctx.fillRect(Math.min(x0, x1), top, Math.abs(x1 - x0), height);
    }

    ctx.restore();
}

// The edge lines with their labels at the top, over the lines.
function drawEdges(u, state) {
    const { ctx } = u;
    const { left, top, width, height } = u.bbox;
    const px = uPlot.pxRatio;
    ctx.save();
    ctx.beginPath();
    ctx.rect(left, top, width, height);
    ctx.clip();
    ctx.font = `${11 * px}px system-ui, sans-serif`;
    ctx.textBaseline = "top";
    ctx.lineWidth = px;
    for (const edge of state.spec.edges) {
        const x = Math.round(u.valToPos(edge.frequencyHz, "x", true));
        ctx.strokeStyle = edge.colour;
        ctx.fillStyle = edge.colour;
        ctx.setLineDash((DASHES[edge.dash] ?? []).map(d => d * px));
        ctx.beginPath();
        ctx.moveTo(x, top);
        ctx.lineTo(x, top + height);
        ctx.stroke();
        ctx.fillText(edge.label, x + 3 * px, top + 3 * px);
    }

    ctx.restore();
}

function drawn(element, state) {
    state.draws += 1;
    element.setAttribute("data-drawn", String(state.draws));
    element.dispatchEvent(new CustomEvent("winding-chart-drawn", { detail: { draws: state.draws } }));
}

function options(element, state, spec) {
    const valueAxis = (scale, label, side, grid) => ({
        scale,
        label,
        side,
        stroke: textColour,
        grid: { show: grid, stroke: GRID, width: 1 },
        ticks: { stroke: GRID, width: 1 },
        values: (u, splits) => splits.map(v => v == null ? null : String(Number(v.toPrecision(6)))),
    });
    return {
        width: Math.max(element.clientWidth, 200),
        height: HEIGHT,
        scales: {
            // Log frequency axis over exactly the plotted frequencies.
            x: { time: false, distr: 3, log: 10, range: (u, min, max) => [min, max] },
            il: { range: toZero },
            rl: { range: toZero },
        },
        axes: [
            {
                scale: "x",
                label: spec.frequencyTitle,
                stroke: textColour,
                grid: { stroke: GRID, width: 1 },
                ticks: { stroke: GRID, width: 1 },
                splits: decadeSplits,
                values: (u, splits) => splits.map(v => v == null ? null : hertz(v, 3)),
            },
            valueAxis("il", spec.leftTitle, 3, true),
            valueAxis("rl", spec.rightTitle, 1, false),
        ],
        series: [
            { label: spec.frequencyTitle, value: (u, v) => hertz(v, 4) },
            ...spec.series.map(s => ({
                label: s.name,
                scale: s.axis === "right" ? "rl" : "il",
                stroke: s.colour,
                width: s.width,
                dash: DASHES[s.dash],
                spanGaps: s.spansGaps,
                points: { show: false },
                value: (u, v) => v == null || !Number.isFinite(v) ? "—" : `${v.toFixed(s.decimals)} ${s.unit}`,
            })),
        ],
        legend: { show: true, live: true },
        hooks: {
            drawClear: [u => drawSpans(u, state)],
            draw: [u => { drawEdges(u, state); drawn(element, state); }],
        },
    };
}

function remember(element, spec) {
    element.windingChart = {
        x: spec.frequenciesHz,
        series: spec.series.map(s => ({ name: s.name, values: s.values })),
    };
}

function build(element, state, spec) {
    state.plot?.destroy();
    state.spec = spec;
    state.key = layoutKey(spec);
    remember(element, spec);
    state.plot = new uPlot(options(element, state, spec), data(spec), element);
}

/** Draws the plot (a JSON string or object) into element as a new chart, replacing any chart already there. */
export function create(element, plot) {
    if (!element) {
        return;
    }

    const spec = typeof plot === "string" ? JSON.parse(plot) : plot;
    let state = element._windingChartState;
    if (!state) {
        state = { plot: null, spec: null, key: null, draws: 0, observer: null, width: element.clientWidth };
        element._windingChartState = state;
        charts.add(state);
        watchPrinting();
        // A theme switch changes the container's text colour; its (1 ms) colour transition tells us to redraw the
        // axes, which are painted on the canvas (app.css).
        state.onColour = e => {
            if (e.target === element && e.propertyName === "color") {
                state.plot?.redraw(false, false);
            }
        };
        element.addEventListener("transitionend", state.onColour);
        if (typeof ResizeObserver === "function") {
            state.observer = new ResizeObserver(() => {
                const width = Math.max(element.clientWidth, 200);
                if (state.plot && width !== state.width) {
                    state.width = width;
                    state.plot.setSize({ width, height: HEIGHT });
                }
            });
            state.observer.observe(element);
        }
    }

    build(element, state, spec);
}

/** Draws the plot into element: the existing chart updated in place, or a new chart when there is none or the series changed. */
export function update(element, plot) {
    if (!element) {
        return;
    }

    const state = element._windingChartState;
    const spec = typeof plot === "string" ? JSON.parse(plot) : plot;
    if (!state?.plot || state.key !== layoutKey(spec)) {
        create(element, spec);
        return;
    }

    state.spec = spec;
    remember(element, spec);
    state.plot.setData(data(spec), true);
}

/** Removes the chart from element. */
export function dispose(element) {
    const state = element?._windingChartState;
    if (!state) {
        return;
    }

    charts.delete(state);
    element.removeEventListener("transitionend", state.onColour);
    state.observer?.disconnect();
    state.plot?.destroy();
    delete element._windingChartState;
    delete element.windingChart;
}
