package sheet

import (
	"math"

	"github.com/paulmach/orb"

	"arcwright/internal/geometry"
	"arcwright/internal/planner"
)

// planView is the plan being drawn: its frame, transform, shapes, labels and
// the placer that keeps the labels apart.
type planView struct {
	b        *builder
	frame    Rect
	t        transform
	shapes   []Shape
	labels   []Label
	pl       *placer
	markR    float64 // station symbol radius, mm
	idSize   float64 // station ID size, pt
	lines    int     // sidelines dimensioned so far
	centres  []centreNote
	pos      map[*planner.Station]Pt
	notes    []string  // notes for the panel under the legend
	refTexts []Text    // texts of the reference symbol
	callouts []callout // dimension and coordinate callouts to place
	angles   []callout // angle labels to place where there is room
	// hazardLabels are the words of the warning triangles, placed before
	// every other callout
	hazardLabels []callout
	datumOut     bool // the datum lies outside the frame and is not drawn
	// offHatch holds the stations whose IDs went on a leader to keep off
	// the hatch beside their marks
	offHatch map[string]bool
	// name is the view's name, "" for the plan; scale its denominator
	name  string
	scale int
}

// viewName returns the name of the view the labels belong to.
func (v *planView) viewName() string {
	if v.name == "" {
		return "plan"
	}
	return v.name
}

// planExtent returns the cell-frame rectangle the plan must show, m: the
// boundary padded by the treatment depth when the cell is bounded,
// otherwise the obstacles, keep-outs, collector and marks with a margin;
// in both cases also the datum, the nozzle, the array centres and every
// station (a station outside the boundary must still be seen).
func (b *builder) planExtent() orb.Bound {
	c := &b.req.Cell
	var bd orb.Bound
	if c.Bounded() {
		bd = c.Boundary.Bound().Pad(c.TreatmentDepth)
	} else {
		bd = c.Extent()
	}
	bd = bd.Extend(orb.Point{0, 0})
	for _, m := range c.Marks {
		bd = bd.Extend(m.At)
	}
	bd = b.extendWorks(bd)
	if !c.Bounded() {
		w, h := bd.Max[0]-bd.Min[0], bd.Max[1]-bd.Min[1]
		bd = bd.Pad(math.Max(1, 0.05*math.Max(w, h)))
	}
	// never draw less than 1 m square
	if w := bd.Max[0] - bd.Min[0]; w < 1 {
		bd.Min[0], bd.Max[0] = bd.Min[0]-(1-w)/2, bd.Max[0]+(1-w)/2
	}
	if h := bd.Max[1] - bd.Min[1]; h < 1 {
		bd.Min[1], bd.Max[1] = bd.Min[1]-(1-h)/2, bd.Max[1]+(1-h)/2
	}
	return bd
}

// nozzleLen is the length of the nozzle body drawn upstream of the exit, m.
func nozzleLen(d float64) float64 { return 3 * d }

// planPage lays out sheet 1.
func (b *builder) planPage(asked int, field string) error {
	vf := Rect{b.frame.X, b.frame.Y, b.frame.W - b.colW - gapMM, b.frame.H - stripH}
	inner := vf.inset(viewPad)
	fit, err := b.fitPlan(asked, field, inner.W, inner.H)
	if err != nil {
		return err
	}
	ext, scale := fit.ext, fit.scale
	b.model.Scale = scale
	b.cropped = fit.cropped
	// a feet-and-inches plan at an engineer's scale is a site plan: its
	// callouts are in decimal feet (common practice)
	cx, cy := (ext.Min[0]+ext.Max[0])/2, (ext.Min[1]+ext.Max[1])/2
	v := &planView{
		b: b, frame: vf,
		t:   newTransform(scale, cx, cy, Pt{inner.X + inner.W/2, inner.Y + inner.H/2}),
		pl:  newPlacer(vf.inset(0.8)),
		pos: make(map[*planner.Station]Pt), scale: scale,
	}
	z := b.zs
	v.grid()
	v.cell()
	v.drawZones(z)
	noise := v.noiseContours()
	v.nozzle()
	v.collector()
	v.positions()
	v.arrays()
	v.centreCallouts()
	v.stations()
	v.floorMarks()
	v.datum()
	v.reference()
	v.hazardMarks()
	v.pl.hatchFrom(v.shapes)
	v.placeLabels(z)
	v.clipFeatureLabels()
	v.placeNoiseLabels(noise)
	b.details = v.findDetails()

	b.model.Pages = append(b.model.Pages, Page{})
	pg := &b.model.Pages[0]
	pg.Views = []View{{Name: "plan", Frame: vf, Scale: scale, Shapes: v.shapes}}
	pg.Labels = v.labels
	pg.Texts = append(pg.Texts, v.refTexts...)
	b.scaleStrip(pg, vf)
	return b.column(pg, v.notes)
}

// grid draws the light coordinate grid from the datum and labels it at the
// left and bottom edges of the frame in the layout's units.
func (v *planView) grid() {
	b := v.b
	g := gridSpacing(v.scale, b.req.Units, 18)
	u := unitLen(b.req.Units)
	x0, y0 := v.t.world(Pt{v.frame.X, v.frame.Bottom()})
	x1, y1 := v.t.world(Pt{v.frame.Right(), v.frame.Y})
	sz := sizeSmall
	capH := capHeight(sz)
	for i := math.Ceil(x0 / g); i*g <= x1; i++ {
		p := v.t.pt(i*g, 0)
		v.shapes = append(v.shapes, line(StyleGrid, Pt{p.X, v.frame.Y}, Pt{p.X, v.frame.Bottom()}))
		s := trimNum(i * g / u)
		w := b.m.width(s, sz, false)
		if p.X-w/2 < v.frame.X+8 || p.X+w/2 > v.frame.Right()-2 {
			continue
		}
		r := Rect{p.X - w/2 - 0.3, v.frame.Bottom() - 1.2 - capH - 0.4, w + 0.6, capH + 0.8}
		v.pl.block(r)
		v.labels = append(v.labels, Label{Text: s, Kind: FeatureLabel, For: "grid X", X: r.X, Y: r.Y, W: r.W, H: r.H, Size: sz, Anchor: Pt{p.X, v.frame.Bottom()}, View: v.viewName()})
	}
	for j := math.Ceil(y0 / g); j*g <= y1; j++ {
		p := v.t.pt(0, j*g)
		v.shapes = append(v.shapes, line(StyleGrid, Pt{v.frame.X, p.Y}, Pt{v.frame.Right(), p.Y}))
		s := trimNum(j * g / u)
		w := b.m.width(s, sz, false)
		if p.Y-capH < v.frame.Y+2 || p.Y+capH > v.frame.Bottom()-6 {
			continue
		}
		r := Rect{v.frame.X + 0.8, p.Y - capH/2 - 0.4, w + 0.6, capH + 0.8}
		v.pl.block(r)
		v.labels = append(v.labels, Label{Text: s, Kind: FeatureLabel, For: "grid Y", X: r.X, Y: r.Y, W: r.W, H: r.H, Size: sz, Anchor: Pt{v.frame.X, p.Y}, View: v.viewName()})
	}
	// axis names at the ends of the labelled edges
	for _, a := range []struct {
		s string
		p Pt
	}{
		{"X, " + unitSym(b.req.Units), Pt{v.frame.Right() - 1, v.frame.Bottom() - 1.2 - capH - 0.4}},
		{"Y, " + unitSym(b.req.Units), Pt{v.frame.X + 0.8, v.frame.Y + 1}},
	} {
		w := b.m.width(a.s, sz, true)
		x := a.p.X
		if a.s[0] == 'X' {
			x -= w + 0.6
		}
		r := Rect{x, a.p.Y, w + 0.6, capH + 0.8}
		if v.pl.free(r) {
			v.pl.take(r)
			v.labels = append(v.labels, Label{Text: a.s, Kind: FeatureLabel, For: "grid axis", X: r.X, Y: r.Y, W: r.W, H: r.H, Size: sz, Anchor: a.p, View: v.viewName()})
		}
	}
	if v.name == "" {
		b.gridStep = g
	}
}

// ringPts returns the page points of a world ring.
func (v *planView) ringPts(r [][2]float64) []Pt {
	out := make([]Pt, len(r))
	for i, p := range r {
		out[i] = v.t.pt(p[0], p[1])
	}
	return out
}

func orbPts(r orb.Ring) [][2]float64 {
	out := make([][2]float64, len(r))
	for i, p := range r {
		out[i] = [2]float64(p)
	}
	return out
}

// cell draws the treatment, the boundary, keep-out zones and obstacles.
func (v *planView) cell() {
	c := &v.b.req.Cell
	if c.Bounded() {
		inner := v.ringPts(orbPts(c.Boundary))
		if c.TreatmentDepth > 0 {
			outer := v.ringPts(orbPts(offsetRing(c.Boundary, c.TreatmentDepth)))
			v.shapes = append(v.shapes, poly(StyleTreatment, outer, inner))
		}
		if c.Kind == geometry.OutdoorPad {
			v.shapes = append(v.shapes, poly(StyleSiteLimit, inner))
			v.siteLimitLabel(inner)
		} else {
			v.shapes = append(v.shapes, poly(StyleBoundary, inner))
		}
		if v.name == "" && v.b.cropped {
			v.breakMarks(inner)
		}
	}
	for _, k := range c.KeepOuts {
		if pts := v.inFrame(k.Footprint.Outline(48)); pts != nil {
			v.shapes = append(v.shapes, poly(StyleKeepOut, pts))
		}
	}
	for _, o := range c.Obstacles {
		if pts := v.inFrame(o.Footprint.Outline(48)); pts != nil {
			v.shapes = append(v.shapes, poly(StyleObstacle, pts))
		}
	}
}

// inFrame returns the outline r (cell frame, m) on the page cut to the
// view's frame (a cropped site's obstacles stop at the frame line), nil
// when none of it is inside.
func (v *planView) inFrame(r orb.Ring) []Pt {
	pts := v.ringPts(orbPts(r))
	if bd := boundOf(pts); v.frame.Contains(bd) {
		return pts
	}
	if pts = clipRing(pts, v.frame); len(pts) < 3 {
		return nil
	}
	return pts
}

// clipFeatureLabels keeps the names of obstacles and keep-out zones to
// what the plan shows: a name whose outline is wholly outside the frame is
// dropped, and one whose centre is outside it has its leader drawn to the
// middle of the part inside, so that no leader runs past the frame line.
func (v *planView) clipFeatureLabels() {
	c := &v.b.req.Cell
	parts := map[string][]Pt{}
	for _, o := range c.Obstacles {
		parts[o.Name] = v.inFrame(o.Footprint.Outline(48))
	}
	for _, k := range c.KeepOuts {
		parts[k.Name] = v.inFrame(k.Footprint.Outline(48))
	}
	in := func(q Pt) bool {
		return q.X >= v.frame.X && q.X <= v.frame.Right() && q.Y >= v.frame.Y && q.Y <= v.frame.Bottom()
	}
	out := v.labels[:0]
	for _, l := range v.labels {
		pts, named := parts[l.For]
		if l.Kind == FeatureLabel && named {
			if pts == nil {
				continue // not on the plan
			}
			if !in(l.Anchor) {
				var m Pt
				for _, q := range pts {
					m = add(m, q)
				}
				l.Anchor = mul(m, 1/float64(len(pts)))
				if len(l.Line) == 2 {
					l.Line = []Pt{l.Anchor, l.Line[1]}
				}
			}
		}
		out = append(out, l)
	}
	v.labels = out
}

// siteLimitLabel names an outdoor site limit (page ring inner) on the plan:
// where the jet axis crosses it downstream when that is in the frame, else
// at the middle of the first of its edges in the frame.
func (v *planView) siteLimitLabel(inner []Pt) {
	f := v.frame.inset(4)
	in := func(p Pt) bool { return p.X > f.X && p.X < f.Right() && p.Y > f.Y && p.Y < f.Bottom() }
	var at []Pt
	if _, hi := v.b.axisWalls(); finite(hi) {
		a := v.b.req.Exit.ToCell(geometry.JetPoint{X: hi})
		at = append(at, v.t.pt(a.X, a.Y))
	}
	for i := range inner {
		at = append(at, mul(add(inner[i], inner[(i+1)%len(inner)]), 0.5))
	}
	for _, p := range at {
		if in(p) && v.placeText("site limit", FeatureLabel, "site limit", sizeSmall, p, Pt{0.7, -0.7}, 1, []float64{2, 4, 7}) {
			return
		}
	}
}

// breakMarks draws a break mark (a short zigzag across the line) where the
// boundary ring crosses the frame of a cropped plan, 3 mm inside it, and
// says in the notes that the plan is cropped.
func (v *planView) breakMarks(ring []Pt) {
	f := v.frame
	for i := range ring {
		a, c := ring[i], ring[(i+1)%len(ring)]
		// Liang–Barsky: the part of a→c inside the frame is t0…t1
		d := sub(c, a)
		t0, t1 := 0.0, 1.0
		ok := true
		for _, e := range [][2]float64{{-d.X, a.X - f.X}, {d.X, f.Right() - a.X}, {-d.Y, a.Y - f.Y}, {d.Y, f.Bottom() - a.Y}} {
			p, q := e[0], e[1]
			if p == 0 {
				ok = ok && q >= 0
				continue
			}
			r := q / p
			if p < 0 {
				t0 = math.Max(t0, r)
			} else {
				t1 = math.Min(t1, r)
			}
		}
		if !ok || t0 >= t1 {
			continue
		}
		u := unit(d, Pt{1, 0})
		n := perp(u)
		mark := func(at Pt, inward Pt) {
			p := add(at, mul(inward, 3))
			v.shapes = append(v.shapes, line(StyleBoundary, add(sub(p, mul(u, 1.2)), mul(n, 1.6)), add(p, mul(n, 1.2)), sub(p, mul(n, 1.2)), sub(add(p, mul(u, 1.2)), mul(n, 1.6))))
		}
		if t0 > 0 {
			mark(add(a, mul(d, t0)), u)
		}
		if t1 < 1 {
			mark(add(a, mul(d, t1)), mul(u, -1))
		}
	}
	v.notes = append(v.notes, "The plan is cropped to the stations, zones and nozzle: the boundary runs on past the break marks at the frame, or lies wholly outside it.")
}

// walled reports whether the cell's boundary is a wall that stops the jet:
// a bounded room or chamber. An outdoor site limit is not a wall (issue 8):
// the jet runs on beyond it, and the sheet draws the zones on past it.
func (b *builder) walled() bool {
	c := &b.req.Cell
	return c.Bounded() && c.Kind != geometry.OutdoorPad
}

// drawZones draws the margin bands, the velocity and hot zones and the
// potential core of the governing point, and notes where they run out of
// the frame.
func (v *planView) drawZones(z zoneSet) {
	fr := v.b.req.Exit
	// in a walled cell the zones stop at the walls: past them there is
	// no free jet to draw (the planner warns where a zone meets a wall);
	// an outdoor site limit is not a wall, the zones run on beyond it
	var clip []Pt
	if c := &v.b.req.Cell; v.b.walled() {
		clip = v.ringPts(orbPts(c.Boundary))
	}
	zone := func(s Style, o zoneOutline) {
		sh := poly(s, v.ringPts(planRing(fr, o)))
		sh.Clip = clip
		v.shapes = append(v.shapes, sh)
	}
	for _, o := range []zoneOutline{z.velM, z.hotM} {
		if o != nil {
			zone(StyleMargin, o)
		}
	}
	if z.vel != nil {
		zone(StyleVelocity, z.vel)
	}
	if z.hot != nil {
		zone(StyleHot, z.hot)
	}
	v.drawCarried(z, clip)
	if z.core > 0 {
		core := zoneOutline{{0, 0}, {0, z.exitR}, {z.core, 0}}
		v.shapes = append(v.shapes, poly(StyleCore, v.ringPts(planRing(fr, core))))
	}
}

// nozzle draws the nozzle body, its exit and the jet axis across the frame.
func (v *planView) nozzle() {
	fr := v.b.req.Exit
	d := v.b.gov.Exit.Diameter
	// draw at least 1.2 mm wide so the nozzle is seen at small scales
	d = math.Max(d, 1.2/v.t.k)
	l := nozzleLen(d)
	at := func(x, r float64) Pt {
		c := fr.ToCell(geometry.JetPoint{X: x, R: math.Abs(r), Azimuth: az(r)})
		return v.t.pt(c.X, c.Y)
	}
	body := []Pt{at(0, d/2), at(-l, 0.8*d), at(-l, -0.8*d), at(0, -d/2)}
	v.shapes = append(v.shapes, poly(StyleNozzle, body))
	v.pl.block(boundOf(body))
	// the axis, from behind the nozzle to beyond the frame
	far := (v.frame.W + v.frame.H) / v.t.k
	v.shapes = append(v.shapes, line(StyleAxis, at(-l-0.5*d-2/v.t.k, 0), at(far, 0)))
}

// az returns the azimuth of the side a signed plan offset r lies on: left
// (0) for r >= 0, right (π) otherwise.
func az(r float64) float64 {
	if r < 0 {
		return math.Pi
	}
	return 0
}

// collector draws the exhaust collector: its inlet across its axis, the
// duct walls and the axis.
func (v *planView) collector() {
	col := v.b.req.Cell.Collector
	if col == nil {
		return
	}
	s, c := math.Sincos(col.Heading)
	ax, left := Pt{c, s}, Pt{-s, c} // world plan directions
	w := func(p Pt) Pt { return v.t.pt(p.X, p.Y) }
	in := Pt{col.Inlet.X, col.Inlet.Y}
	r := col.Diameter / 2
	duct := math.Max(col.Diameter, 1)
	p1, p2 := add(in, mul(left, r)), sub(in, mul(left, r))
	v.shapes = append(v.shapes,
		line(StyleCollector, w(p1), w(p2)),
		line(StyleBase, w(p1), w(add(p1, mul(ax, duct)))),
		line(StyleBase, w(p2), w(add(p2, mul(ax, duct)))),
		line(StyleAxis, w(sub(in, mul(ax, 0.3*r))), w(add(in, mul(ax, duct+0.3*r)))),
	)
	v.pl.block(boundOf([]Pt{w(p1), w(p2)}))
}
