// arcwright live plan: fetches the plan and its drawing from the server
// that serves this page, and fetches them again on each "plan" event.
"use strict";

(function () {
  const $ = (id) => document.getElementById(id);
  let plan = null;        // the last good plan (the /plan.json document)
  let status = null;      // the last /status.json
  let picked = null;      // the station ID shown in the detail panel
  let zonePick = "";      // "" = the zones the sheet draws, else a point's name
  let loading = null;     // the load under way
  let again = false;      // another load was asked for meanwhile

  const FT = 0.3048;      // m per international foot
  function len(m) {
    if (m === null || m === undefined) return "–";
    if (imperial()) return (m / FT).toFixed(2) + " ft";
    return m.toFixed(3) + " m";
  }
  function imperial() { return status && status.units === "imperial"; }
  function num(v, unit) {
    if (v === null || v === undefined) return "–";
    if (typeof v === "boolean") return v ? "yes" : "no";
    if (unit === "m") return len(v);
    if (unit === "m/s" && imperial()) return num(v / FT, "ft/s");
    if (unit === "K") return imperial() ? ((v - 273.15) * 9 / 5 + 32).toFixed(1) + " °F" : (v - 273.15).toFixed(1) + " °C";
    const s = Math.abs(v) >= 100 ? v.toFixed(0) : Math.abs(v) >= 10 ? v.toFixed(1) : v.toPrecision(3);
    return unit ? s + " " + unit : s;
  }
  // checkName returns a check's name in words, without its unit suffix
  // (the value carries the unit).
  function checkName(n) {
    return n.replace(/_(m_s|hz|db)$/, "").replace(/_/g, " ");
  }
  function el(tag, attrs, ...kids) {
    const e = document.createElement(tag);
    for (const [k, v] of Object.entries(attrs || {})) {
      if (k === "class") e.className = v; else e.setAttribute(k, v);
    }
    for (const k of kids) e.append(k instanceof Node ? k : document.createTextNode(String(k)));
    return e;
  }

  function setState(s, text) {
    const st = $("state");
    st.dataset.state = s;
    st.textContent = text;
  }

  async function load() {
    if (loading) { again = true; return loading; }
    loading = (async () => {
      do {
        again = false;
        try {
          await loadOnce();
        } catch (e) {
          setState("offline", "server gone");
        }
      } while (again);
      loading = null;
    })();
    return loading;
  }

  async function loadOnce() {
    const [sr, jr, vr] = await Promise.all([fetch("/status.json"), fetch("/plan.json"), fetch("/plan.svg")]);
    // a save between the three answers: ask again for a matching set
    const versions = new Set([sr, jr, vr].map((r) => r.headers.get("X-Arcwright-Version")));
    if (versions.size > 1) again = true;
    status = await sr.json();
    $("file").textContent = status.file;
    document.title = "arcwright live plan — " + status.file;
    if (jr.status === 200) plan = await jr.json();
    else await jr.text();
    const svg = vr.status === 200 ? await vr.text() : null;
    if (svg !== null) showDrawing(svg);
    const stale = !status.current;
    showProblems(status.errors || []);
    $("stale-note").textContent = status.has_plan
      ? "Until they are fixed, the drawing and tables below are the last good plan, not the file as it is now."
      : "The file has not planned since the server started, so there is nothing to draw yet. Fix the problems and save.";
    if (!status.has_plan) $("svg-holder").replaceChildren(el("p", { class: "empty" }, "No drawing yet: the layout has problems (listed above)."));
    document.querySelector(".tables").classList.toggle("none", !plan);
    $("zones-pick").classList.toggle("none", !status.has_plan);
    $("drawing").dataset.stale = String(stale && status.has_plan);
    document.querySelector(".tables").classList.toggle("stale", stale);
    if (stale) setState("stale", status.has_plan ? "stale: layout has errors" : "layout has errors");
    else setState("live", "live");
    if (plan) showPlan();
    document.body.dataset.version = String(status.version);
  }

  function showProblems(errs) {
    const box = $("problems");
    const list = $("problem-list");
    list.replaceChildren();
    box.hidden = errs.length === 0;
    if (!errs.length) return;
    $("problems-title").textContent = errs.length === 1 ? "The layout has a problem" : "The layout has " + errs.length + " problems";
    for (const e of errs) {
      const where = e.file + (e.line ? ":" + e.line : "");
      const li = el("li", {}, el("span", { class: "where" }, where), " ");
      if (e.key) li.append(el("span", { class: "pkey" }, e.key), " ");
      li.append(e.message);
      list.append(li);
    }
  }

  function showDrawing(svg) {
    const holder = $("svg-holder");
    holder.innerHTML = svg;
    const root = holder.querySelector("svg");
    if (!root) return;
    root.removeAttribute("width");
    root.removeAttribute("height");
    const vb = (root.getAttribute("viewBox") || "").split(/\s+/).map(Number);
    const same = full && vb.length === 4 && vb.every((x, i) => Math.abs(x - full[i]) < 0.01);
    full = vb.length === 4 && vb.every(isFinite) ? vb : null;
    if (!same) view = null; // a new extent: show the whole plan again
    applyView();
    // zone selector: the sheet's zones and each point's
    const sel = $("zone-select");
    const groups = root.querySelectorAll("g.zones");
    sel.replaceChildren();
    let have = false;
    for (const g of groups) {
      const name = g.getAttribute("data-point");
      const label = name === "" ? "as on the sheet (the largest zones)" : "point " + name;
      sel.append(el("option", { value: name }, label));
      if (name === zonePick) have = true;
    }
    if (!have) zonePick = "";
    sel.value = zonePick;
    applyZones(root);
    for (const g of root.querySelectorAll("g.station")) {
      g.setAttribute("tabindex", "0");
      g.setAttribute("role", "button");
      g.setAttribute("aria-label", "station " + g.dataset.id + ", " + g.dataset.verdict);
      const show = () => pick(g.dataset.id);
      g.addEventListener("mouseenter", show);
      g.addEventListener("focus", show);
      g.addEventListener("click", show);
    }
    markPicked();
  }

  // zoom and pan: the drawing's viewBox; null shows the whole plan
  let view = null;
  let full = null;        // the drawing's own viewBox
  function svgRoot() { return document.querySelector("#svg-holder svg"); }
  function applyView() {
    const root = svgRoot();
    if (!root || !full) return;
    const v = view || full;
    root.setAttribute("viewBox", v.map((x) => x.toFixed(2)).join(" "));
    root.classList.toggle("zoomed", view !== null);
  }
  function zoom(f, cx, cy) {
    if (!full) return;
    const [x, y, w, h] = view || full;
    if (cx === undefined) { cx = x + w / 2; cy = y + h / 2; }
    const nw = w * f;
    if (nw >= full[2]) { view = null; applyView(); return; }
    if (nw < full[2] / 40) return;
    view = [cx - (cx - x) * f, cy - (cy - y) * f, nw, h * f];
    applyView();
  }
  function toUser(root, ev) {
    const m = root.getScreenCTM();
    if (!m) return null;
    const p = new DOMPoint(ev.clientX, ev.clientY).matrixTransform(m.inverse());
    return [p.x, p.y];
  }
  function wireZoom() {
    const holder = $("svg-holder");
    holder.addEventListener("wheel", (ev) => {
      const root = svgRoot();
      if (!root || !(ev.ctrlKey || ev.metaKey)) return;
      ev.preventDefault();
      const p = toUser(root, ev);
      if (p) zoom(ev.deltaY > 0 ? 1.25 : 0.8, p[0], p[1]);
    }, { passive: false });
    let drag = null;
    holder.addEventListener("pointerdown", (ev) => {
      const root = svgRoot();
      if (!root || !view || ev.target.closest("g.station")) return;
      drag = { x: ev.clientX, y: ev.clientY, v: view.slice(), k: view[2] / root.getBoundingClientRect().width };
      root.classList.add("panning");
      holder.setPointerCapture(ev.pointerId);
    });
    holder.addEventListener("pointermove", (ev) => {
      if (!drag) return;
      view = [drag.v[0] - (ev.clientX - drag.x) * drag.k, drag.v[1] - (ev.clientY - drag.y) * drag.k, drag.v[2], drag.v[3]];
      applyView();
    });
    const end = () => { drag = null; const r = svgRoot(); if (r) r.classList.remove("panning"); };
    holder.addEventListener("pointerup", end);
    holder.addEventListener("pointercancel", end);
    $("zoom-in").addEventListener("click", () => zoom(0.67));
    $("zoom-out").addEventListener("click", () => zoom(1.5));
    $("zoom-fit").addEventListener("click", () => { view = null; applyView(); });
  }

  function applyZones(root) {
    root = root || document.querySelector("#svg-holder svg");
    if (!root) return;
    for (const g of root.querySelectorAll("g.zones")) {
      g.setAttribute("display", g.getAttribute("data-point") === zonePick ? "inline" : "none");
    }
    const note = $("zone-note");
    note.hidden = zonePick === "";
    note.textContent = zonePick === "" ? "" : "Showing the conservative zones of point " + zonePick + " alone, with the margin; the caption under the plan names the sheet's zones.";
    // the labels name the sheet's zones: hide them with another point's
    for (const g of root.querySelectorAll("g.zone-label")) {
      g.setAttribute("display", zonePick === "" ? "inline" : "none");
    }
  }

  function pick(id) {
    picked = id;
    showDetail();
    markPicked();
  }

  function markPicked() {
    for (const g of document.querySelectorAll("#svg-holder g.station")) {
      g.classList.toggle("picked", g.dataset.id === picked);
    }
    for (const tr of document.querySelectorAll("#stations tr[data-id]")) {
      tr.classList.toggle("picked", tr.dataset.id === picked);
    }
  }

  function station(id) {
    if (!plan) return null;
    return plan.stations.find((s) => s.id === id) || null;
  }

  function showDetail() {
    const box = $("detail");
    const s = station(picked);
    box.replaceChildren(el("h2", {}, "Station"));
    if (!s) {
      box.append(el("p", { class: "empty" }, "Point at a station on the plan, or pick one in the table, to see every check and its reason."));
      return;
    }
    box.append(el("div", { class: "title" }, el("span", { class: "id" }, s.id), el("span", { class: "badge " + s.status }, s.status)));
    const facts = "array " + s.array + " (" + s.kind + " #" + s.index + ")" +
      " · X " + len(s.x_m) + ", Y " + len(s.y_m) + ", height " + len(s.z_m) +
      (s.polar_deg !== null ? " · polar " + s.polar_deg.toFixed(1) + "° " + (plan.polar_angle_convention || "").replace(/_/g, " ") : "") +
      (s.governing_point ? " · governed by " + s.governing_point : "");
    box.append(el("p", { class: "facts" }, facts));
    const t = el("table", { class: "checks" });
    for (const c of s.check_details) {
      const tr = el("tr", { class: c.verdict },
        el("td", {}, checkName(c.name)),
        el("td", { class: "v" }, num(c.value, c.unit)),
        el("td", {}, el("span", { class: "badge " + c.verdict }, c.verdict)));
      t.append(tr);
      t.append(el("tr", { class: c.verdict }, el("td", { class: "reason", colspan: "3" }, c.reason + (c.point && !c.reason.includes(c.point) ? " (" + c.point + ")" : ""))));
    }
    box.append(t);
  }

  function showPlan() {
    const c = $("counts");
    c.replaceChildren(
      el("span", { class: "c c-ok" }, "○ " + plan.counts.ok + " ok"),
      el("span", { class: "c c-warn" }, "△ " + plan.counts.warn + " warn"),
      el("span", { class: "c c-blocked" }, "⊗ " + plan.counts.blocked + " blocked"));
    // stations
    const st = $("stations");
    st.replaceChildren(el("thead", {}, el("tr", {}, ...["station", "verdict", "array", "X", "Y", "height", "polar", "governing point", "reasons"].map((h) => el("th", {}, h)))));
    const body = el("tbody");
    for (const s of plan.stations) {
      const tr = el("tr", { class: "row-pick", "data-id": s.id },
        el("td", {}, s.id), el("td", {}, el("span", { class: "badge " + s.status }, s.status)), el("td", {}, s.array),
        el("td", { class: "n" }, len(s.x_m)), el("td", { class: "n" }, len(s.y_m)), el("td", { class: "n" }, len(s.z_m)),
        el("td", { class: "n" }, s.polar_deg === null ? "–" : s.polar_deg.toFixed(1) + "°"),
        el("td", {}, s.governing_point || "–"),
        el("td", { class: "reasons" }, s.reasons.length ? s.reasons.join("; ") : "every check passed"));
      tr.addEventListener("click", () => pick(s.id));
      body.append(tr);
    }
    st.append(body);
    // operating points
    const pt = $("points");
    pt.replaceChildren(el("thead", {}, el("tr", {}, ...["point", "NPR", "exit Mach", "exit velocity", "total temperature", "core", "velocity zone (length × width)", "hot zone (length × width)", "collector", "flags"].map((h) => el("th", {}, h)))));
    const pb = el("tbody");
    for (const p of plan.points) {
      const zone = (l, r) => (l > 0 ? len(l) + " × " + len(2 * r) : "none");
      const gov = p.name === plan.governing_point ? " (largest velocity zone)" : p.name === plan.governing_hot_point ? " (longest hot zone)" : "";
      pb.append(el("tr", {},
        el("td", {}, p.name + gov),
        el("td", { class: "n" }, num(p.nozzle_pressure_ratio)),
        el("td", { class: "n" }, num(p.exit.mach)),
        el("td", { class: "n" }, num(p.exit.velocity_m_s, "m/s")),
        el("td", { class: "n" }, num(p.exit.total_temperature_k, "K")),
        el("td", { class: "n" }, len(p.potential_core_length_m)),
        el("td", { class: "n" }, zone(p.velocity_envelope_length_m, p.velocity_envelope_max_radius_m)),
        el("td", { class: "n" }, zone(p.hot_envelope_length_m, p.hot_envelope_max_radius_m)),
        el("td", {}, p.collector_capture ? p.collector_capture + (p.capture_reason ? ": " + p.capture_reason : "") : "–"),
        el("td", {}, (p.flags || []).map((f) => (typeof f === "string" ? f : f.reason || f.name || JSON.stringify(f))).join("; ") || "–")));
    }
    pt.append(pb);
    // warnings
    const w = $("warnings");
    w.replaceChildren(...(plan.warnings.length ? plan.warnings.map((s) => el("li", {}, s)) : [el("li", {}, "none")]));
    showDetail();
    markPicked();
  }

  function start() {
    wireZoom();
    $("zone-select").addEventListener("change", (e) => {
      zonePick = e.target.value;
      applyZones();
    });
    const es = new EventSource("/events");
    es.addEventListener("plan", () => load());
    es.addEventListener("open", () => load());
    es.addEventListener("error", () => setState("offline", "reconnecting…"));
    load();
  }
  if (document.readyState === "loading") document.addEventListener("DOMContentLoaded", start);
  else start();
})();
