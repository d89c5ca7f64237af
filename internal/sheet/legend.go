package sheet

import (
	"math"
	"strings"

	"arcwright/internal/geometry"
	"arcwright/internal/planner"
)

// legendEntry is one symbol of the legend and its explanation.
type legendEntry struct {
	sample func(r Rect) []Shape
	text   string
}

func (b *builder) legendEntries() []legendEntry {
	c := &b.req.Cell
	pr := b.pr
	var e []legendEntry
	add := func(f func(r Rect) []Shape, text string) { e = append(e, legendEntry{f, text}) }
	mid := func(r Rect) (Pt, Pt) { return Pt{r.X, r.Y + r.H/2}, Pt{r.Right(), r.Y + r.H/2} }
	if c.Bounded() {
		what := map[geometry.Kind]string{
			geometry.Anechoic:   "boundary: wedge-tip plane",
			geometry.HardWalled: "boundary: inner wall face",
			geometry.OutdoorPad: "site limit",
		}[c.Kind]
		st := StyleBoundary
		if c.Kind == geometry.OutdoorPad {
			what, st = "site limit (not a wall: the zones run on beyond it)", StyleSiteLimit
		}
		add(func(r Rect) []Shape { a, z := mid(r); return []Shape{line(st, a, z)} }, what)
		if c.TreatmentDepth > 0 {
			add(func(r Rect) []Shape { return []Shape{rectShape(StyleTreatment, r)} }, "acoustic treatment behind it")
		}
	}
	if len(c.Obstacles) > 0 {
		add(func(r Rect) []Shape { return []Shape{rectShape(StyleObstacle, r)} }, "obstacle, named")
	}
	if len(c.KeepOuts) > 0 {
		add(func(r Rect) []Shape { return []Shape{rectShape(StyleKeepOut, r)} }, "keep-out zone, named")
	}
	add(func(r Rect) []Shape { return []Shape{rectShape(StyleVelocity, r)} }, "velocity zone: mean velocity > "+pr.speed(b.lim.Velocity))
	add(func(r Rect) []Shape { return []Shape{rectShape(StyleHot, r)} }, b.hotName()+": total temperature > "+pr.temp(b.lim.Temperature))
	add(func(r Rect) []Shape { return []Shape{rectShape(StyleMargin, r)} }, "margin "+pr.length(b.lim.Margin)+" outside each zone")
	add(func(r Rect) []Shape {
		return []Shape{poly(StyleCore, []Pt{{r.X, r.Y}, {r.Right(), r.Y + r.H/2}, {r.X, r.Bottom()}})}
	}, "potential core (nominal length)")
	add(func(r Rect) []Shape {
		a, z := mid(r)
		return []Shape{line(StyleAxis, a, z), poly(StyleNozzle, []Pt{{r.X, r.Y}, {r.X + 3, r.Y + 0.8}, {r.X + 3, r.Bottom() - 0.8}, {r.X, r.Bottom()}})}
	}, "nozzle and jet axis")
	if c.Collector != nil {
		add(func(r Rect) []Shape {
			x := r.X + 2
			return []Shape{line(StyleCollector, Pt{x, r.Y}, Pt{x, r.Bottom()}), line(StyleBase, Pt{x, r.Y}, Pt{r.Right(), r.Y}), line(StyleBase, Pt{x, r.Bottom()}, Pt{r.Right(), r.Bottom()})}
		}, "exhaust collector inlet")
	}
	if len(b.hazardsDrawn) > 0 {
		add(func(r Rect) []Shape { return warningTriangle(Pt{r.X + 2, r.Y + r.H/2 + 0.3}, 1.5) }, "a zone meets a surface or bends, the collector does not capture it, or a crew position is in a zone: see the warnings")
	}
	add(func(r Rect) []Shape { return datumSymbol(Pt{r.X + r.H/2 + 0.5, r.Y + r.H/2}, r.H/2*0.9) }, "datum (0, 0)")
	if len(c.Marks) > 0 {
		add(func(r Rect) []Shape {
			p := Pt{r.X + 2, r.Y + r.H/2}
			return []Shape{line(StyleTick, Pt{p.X - 1.4, p.Y}, Pt{p.X + 1.4, p.Y}), line(StyleTick, Pt{p.X, p.Y - 1.4}, Pt{p.X, p.Y + 1.4})}
		}, b.ground()+" mark")
	}
	if b.hasKind(planner.Arc) {
		add(func(r Rect) []Shape {
			p := Pt{r.X + 1.8, r.Y + r.H/2}
			s := []Shape{circle(StyleTick, p, 0.9), line(StyleTick, Pt{p.X - 1.6, p.Y}, Pt{p.X + 1.6, p.Y}), line(StyleTick, Pt{p.X, p.Y - 1.6}, Pt{p.X, p.Y + 1.6})}
			return append(s, arrow(StyleDim, Pt{p.X + 2, p.Y}, Pt{r.Right(), p.Y}, 1.2)...)
		}, "arc centre and radius")
	}
	add(func(r Rect) []Shape {
		a, z := mid(r)
		return []Shape{line(StyleArray, a, z), line(StyleTick, Pt{r.X + 3, a.Y}, Pt{r.X + 3, a.Y + 1.5}), line(StyleTick, Pt{r.X + 6, a.Y}, Pt{r.X + 6, a.Y + 1.5})}
	}, "array line; a tick at each station, its nominal polar angle")
	for _, s := range []struct {
		v planner.Verdict
		t string
	}{{planner.OK, "station ok"}, {planner.Warn, "station with a warning"}, {planner.Blocked, "station BLOCKED: do not set"}} {
		add(func(r Rect) []Shape { return markShapes(s.v, Pt{r.X + 2, r.Y + r.H/2}, 1.1) }, s.t)
	}
	if b.hasBoom() {
		add(func(r Rect) []Shape {
			p := Pt{r.X + 1.6, r.Y + r.H/2}
			s := []Shape{circle(StyleBase, p, 1.4), line(StyleBase, p, Pt{r.X + 6.5, p.Y})}
			return append(s, markShapes(planner.OK, Pt{r.X + 6.5, p.Y}, 0.9)...)
		}, "stand base and boom")
	}
	if m := b.noise; m != nil {
		drawn := map[bool]bool{} // by Peak: some contour has a line
		for _, c := range m.Contours {
			drawn[c.Peak] = drawn[c.Peak] || len(c.Lines) > 0
		}
		if drawn[false] {
			add(func(r Rect) []Shape { a, z := mid(r); return []Shape{line(StyleNoiseA, a, z)} }, "predicted dB(A) contour, labelled (point "+m.Point+", at "+pr.length(m.Height)+")")
		}
		if drawn[true] {
			add(func(r Rect) []Shape { a, z := mid(r); return []Shape{line(StyleNoisePeak, a, z)} }, "predicted 140 dB(C) peak contour")
		}
	}
	if len(b.req.Crew) > 0 {
		add(func(r Rect) []Shape {
			p := Pt{r.X + 2, r.Y + r.H/2}
			return []Shape{poly(StyleCrew, []Pt{{p.X - 1, p.Y - 1}, {p.X + 1, p.Y - 1}, {p.X + 1, p.Y + 1}, {p.X - 1, p.Y + 1}})}
		}, "crew position, named")
	}
	add(func(r Rect) []Shape {
		a, z := mid(r)
		return []Shape{line(StyleGrid, a, z), line(StyleGrid, Pt{r.X + 4, r.Y}, Pt{r.X + 4, r.Bottom()})}
	}, "grid "+trimNum(b.gridStep/unitLen(b.req.Units))+" "+unitSym(b.req.Units)+" from datum")
	return e
}

// hasKind reports whether the plan has an array of kind k.
func (b *builder) hasKind(k planner.ArrayKind) bool {
	for _, a := range b.plan.Arrays {
		if a.Kind == k {
			return true
		}
	}
	return false
}

// hasBoom reports whether any station stands on a boom stand.
func (b *builder) hasBoom() bool {
	for _, s := range b.plan.Stations {
		if s.Stand != nil && s.Stand.BoomLength > 0 {
			return true
		}
	}
	return false
}

// legend draws the legend box at r and returns the y of its bottom.
func (b *builder) legend(pg *Page, r Rect) float64 {
	const pad, sw = 2.0, 8.0
	sz := sizeSmall
	lh := lineHeight(sz)
	y := r.Y + pad + capHeight(sizeHeading)
	head := "LEGEND"
	if b.legendLater {
		head = legendHeading
	}
	pg.Texts = append(pg.Texts, b.text(r.X+pad, y, sizeHeading, true, head))
	y += 1.5
	entries := b.legendEntries()
	if len(b.model.Key) > 0 {
		entries = append(entries, legendEntry{func(q Rect) []Shape { return nil }, "number: see the label key"})
	}
	colW := (r.W - 2*pad - 2) / 2
	rows := (len(entries) + 1) / 2
	colY := [2]float64{y, y}
	for i, e := range entries {
		c := i / rows
		x := r.X + pad + float64(c)*(colW+2)
		lines := b.m.wrap(clean(e.text), colW-sw-1.5, sz, false)
		h := math.Max(3.4, float64(len(lines))*lh+0.6)
		cell := Rect{x, colY[c] + 0.3, sw, math.Min(h-0.6, 2.8)}
		pg.Shapes = append(pg.Shapes, e.sample(cell)...)
		if strings.HasPrefix(e.text, "number:") {
			pg.Texts = append(pg.Texts, b.text(x+1.5, cell.Y+cell.H-0.3, sizeNumber, false, "12"))
		}
		for j, l := range lines {
			pg.Texts = append(pg.Texts, Text{X: x + sw + 1.5, Y: colY[c] + capHeight(sz) + 0.6 + float64(j)*lh, Size: sz, Text: l})
		}
		colY[c] += h
	}
	bottom := math.Max(colY[0], colY[1]) + pad - 0.5
	pg.Shapes = append(pg.Shapes, rectShape(StyleBox, Rect{r.X, r.Y, r.W, bottom - r.Y}))
	return bottom
}
