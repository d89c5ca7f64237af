package sheet

import (
	"math"
	"sort"
	"strings"

	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
	"arcwright/internal/planner"
)

// arcStep is the largest turn between two points of a drawn arc, rad (2°).
const arcStep = 2 * math.Pi / 180

// arrayPath returns the 3-D line (cell frame, m) an array's stations lie on:
// circular about the array's centre for arcs and rings (closed for a full
// ring), straight between neighbours for lines; nil for points and probes.
func arrayPath(ar *planner.ArrayResult, ss []*planner.Station) []r3.Vec {
	if len(ss) < 2 {
		return nil
	}
	var out []r3.Vec
	switch ar.Kind {
	case planner.Arc, planner.Ring:
		for i := 0; i+1 < len(ss); i++ {
			seg := slerp(ar.Centre, ss[i].Mic, ss[i+1].Mic, arcStep)
			if i > 0 {
				seg = seg[1:]
			}
			out = append(out, seg...)
		}
		if ar.Kind == planner.Ring && ar.Spec.FullTurn && len(ss) > 2 {
			out = append(out, slerp(ar.Centre, ss[len(ss)-1].Mic, ss[0].Mic, arcStep)[1:]...)
		}
	case planner.Line, planner.NearField:
		for _, s := range ss {
			out = append(out, s.Mic)
		}
	}
	return out
}

// callout is a dimension or coordinate text to place near a point.
type callout struct {
	text   string
	anchor Pt
	dir    Pt
	clear  float64
	far    []float64
	kind   LabelKind
	of     string
	note   string // what the notes say when the callout finds no room; "" for text itself
}

// arrays draws each array's line, the arcs' angle ticks and the dimension
// lines, and queues the dimension callouts for placing.
func (v *planView) arrays() {
	b := v.b
	pr := b.pr
	for i := range b.plan.Arrays {
		ar := &b.plan.Arrays[i]
		ss := b.byArray[ar.Name]
		if path := arrayPath(ar, ss); path != nil {
			pts := make([]Pt, len(path))
			for j, p := range path {
				pts[j] = v.t.pt(p.X, p.Y)
			}
			v.shapes = append(v.shapes, line(StyleArray, pts...))
		}
		if len(ss) == 0 {
			continue
		}
		switch ar.Kind {
		case planner.Arc:
			v.arcDims(ar, ss)
		case planner.Line:
			v.lineDims(ar, ss)
		case planner.Ring:
			c := v.t.pt(ar.Centre.X, ar.Centre.Y)
			v.callouts = append(v.callouts, callout{
				text:   "ring " + ar.Name + " radius " + pr.dim(ar.Radius) + " about the axis",
				anchor: c, dir: Pt{0.3, -1}, clear: 1.5, far: []float64{3, 6, 10, 15, 22, 30},
				kind: DimensionLabel, of: ar.Name,
			})
		}
	}
}

// arcDims draws the arc's centre, its radius line and its angle ticks, and
// queues the centre's coordinates and the radius as callouts.
func (v *planView) arcDims(ar *planner.ArrayResult, ss []*planner.Station) {
	pr := v.b.pr
	c := v.t.pt(ar.Centre.X, ar.Centre.Y)
	const a = 1.6
	mid := ss[len(ss)/2]
	mp := v.t.pt(mid.Mic.X, mid.Mic.Y)
	// the radius line to the station nearest the middle of the arc, if the
	// arc is seen as an arc in plan
	if dist(c, mp) > 8 {
		from := add(c, mul(unit(sub(mp, c), Pt{1, 0}), a+0.5))
		to := sub(mp, mul(unit(sub(mp, c), Pt{1, 0}), v.markR+0.4))
		v.shapes = append(v.shapes, arrow(StyleDim, from, to, 1.4)...)
		m := lerp(c, mp, 0.55)
		v.callouts = append(v.callouts, callout{
			text:   "R " + pr.dim(ar.Radius) + " nominal",
			note:   "arc " + ar.Name + " nominal radius " + pr.length(ar.Radius),
			anchor: m, dir: perp(unit(sub(mp, c), Pt{1, 0})), clear: 0.4, far: []float64{2, 4, 7},
			kind: DimensionLabel, of: ar.Name,
		})
	}
	v.arcTicks(ar, ss, c)
	// arcs about the same centre share one centre mark and callout
	for i := range v.centres {
		if dist(v.centres[i].anchor, c) < 0.5 {
			v.centres[i].names = append(v.centres[i].names, ar.Name)
			return
		}
	}
	v.shapes = append(v.shapes,
		circle(StyleTick, c, 0.9),
		line(StyleTick, Pt{c.X - a, c.Y}, Pt{c.X + a, c.Y}),
		line(StyleTick, Pt{c.X, c.Y - a}, Pt{c.X, c.Y + a}))
	v.pl.block(rectAround(c, a))
	v.centres = append(v.centres, centreNote{anchor: c, dir: unit(sub(c, mp), Pt{0, 1}), x: ar.Centre.X, y: ar.Centre.Y, names: []string{ar.Name}})
}

// centreNote is the callout of the centre shared by one or more arcs.
type centreNote struct {
	anchor, dir Pt
	x, y        float64 // cell frame, m
	names       []string
}

// centreCallouts turns the arc centres into callouts, first in the queue.
func (v *planView) centreCallouts() {
	pr := v.b.pr
	var cs []callout
	for _, c := range v.centres {
		what := "arc " + c.names[0] + " centre"
		if len(c.names) > 1 {
			what = "arcs " + joinAnd(c.names) + " centre"
		}
		cs = append(cs, callout{
			text:   what + ": X " + pr.dim(c.x) + ", Y " + pr.dim(c.y) + " from datum",
			anchor: c.anchor, dir: c.dir, clear: 1.6, far: []float64{3, 6, 10, 15, 22, 30, 40},
			kind: DimensionLabel, of: strings.Join(c.names, ","),
		})
	}
	v.callouts = append(cs, v.callouts...)
}

// arcTicks draws a tick inside the arc at every station and queues the
// nominal polar angle (the one the layout asks for, as the station table's
// "Polar nominal") of every k-th station as a label, k the smallest step
// that keeps the labels 9 mm apart, and of the last one. Arcs smaller than
// 10 mm on the page get none.
func (v *planView) arcTicks(ar *planner.ArrayResult, ss []*planner.Station, c Pt) {
	if v.t.mm(ar.Radius) < 10 {
		return
	}
	gap := math.Inf(1)
	for i := 1; i < len(ss); i++ {
		if d := dist(v.pos[ss[i]], v.pos[ss[i-1]]); d > 0.05 {
			gap = math.Min(gap, d)
		}
	}
	k := 1
	if gap < 9 {
		k = int(math.Ceil(9 / gap))
	}
	for i, s := range ss {
		p := v.pos[s]
		out := sub(p, c)
		if length(out) < 5 {
			continue
		}
		u := unit(out, Pt{1, 0})
		from := sub(p, mul(u, v.markR+0.3))
		l := 1.2
		if i%k == 0 || (i == len(ss)-1 && i%k >= (k+1)/2) {
			l = 2.2
			v.angles = append(v.angles, callout{
				text: roundDeg(setOut(s)), anchor: sub(from, mul(u, l)), dir: mul(u, -1), clear: 0.3,
				kind: AngleLabel, of: ar.Name,
			})
		}
		v.shapes = append(v.shapes, line(StyleTick, from, sub(from, mul(u, l))))
	}
}

// lineDims draws the offset of a sideline from the jet axis as a
// dimension line at its first station.
func (v *planView) lineDims(ar *planner.ArrayResult, ss []*planner.Station) {
	fr := v.b.req.Exit
	// the first line is dimensioned at its first station, the next at its
	// last, and so on, so that lines over the same stretch keep apart
	s := ss[0]
	if v.lines%2 == 1 {
		s = ss[len(ss)-1]
	}
	v.lines++
	foot3 := fr.ToCell(geometry.JetPoint{X: s.Jet.X})
	foot, p := v.t.pt(foot3.X, foot3.Y), v.pos[s]
	if dist(foot, p) < 6 {
		return
	}
	d := unit(sub(p, foot), Pt{0, -1})
	a, e := foot, sub(p, mul(d, v.markR+0.3))
	v.shapes = append(v.shapes, arrow(StyleDim, lerp(a, e, 0.5), e, 1.3)...)
	v.shapes = append(v.shapes, arrow(StyleDim, lerp(a, e, 0.5), a, 1.3)...)
	v.callouts = append(v.callouts, callout{
		text:   "line " + ar.Name + " offset " + v.b.pr.dim(ar.Radius) + " from axis",
		anchor: lerp(a, e, 0.5), dir: perp(d), clear: 0.4, far: []float64{2, 5, 9, 14},
		kind: DimensionLabel, of: ar.Name,
	})
}

// positions finds every station's page position and the symbol size.
func (v *planView) positions() {
	st := v.b.plan.Stations
	pts := make([]Pt, len(st))
	for i := range st {
		pts[i] = v.t.pt(st[i].Mic.X, st[i].Mic.Y)
		v.pos[&st[i]] = pts[i]
	}
	v.markR = markRadius(pts)
}

// stations draws every station's symbol (shape by status), and the base
// footprint and boom of stands with a boom.
func (v *planView) stations() {
	st := v.b.plan.Stations
	pts := make([]Pt, len(st))
	for i := range st {
		pts[i] = v.pos[&st[i]]
	}
	for i := range st {
		s := &st[i]
		p := pts[i]
		base := v.t.pt(s.Base[0], s.Base[1])
		if s.Stand != nil && dist(base, p) > 0.3 {
			v.shapes = append(v.shapes,
				circle(StyleBase, base, math.Max(v.t.mm(s.Stand.BaseRadius), 0.4)),
				line(StyleBase, base, p))
		}
	}
	for i := range st {
		v.shapes = append(v.shapes, markShapes(st[i].Status, pts[i], v.markR)...)
		v.pl.mark(rectAround(pts[i], v.markR*1.15))
	}
}

// markRadius returns the radius of station symbols, mm: 1.1 mm, or less
// where stations crowd, 0.4 of the median distance to the nearest other
// station, but not below 0.5 mm. Stations on the same plan spot (a ring's
// top and bottom) are left out of the median.
func markRadius(pts []Pt) float64 {
	if len(pts) < 2 {
		return 1.1
	}
	// the median matters only between 0.5/0.4 and 1.1/0.4 mm: each
	// distance is looked for no nearer than 1.2 mm and no farther than
	// 2.8 mm, which keeps a dense crowd from searching all round each
	// station (the median of the distances so found is the true one, or
	// lies on the same side of that range)
	t := newPointTree(pts)
	var nn []float64
	for _, p := range pts {
		if d := t.nearestBeyond(p, 0.2, 1.2, 2.8); !math.IsInf(d, 1) {
			nn = append(nn, d)
		}
	}
	if len(nn) == 0 {
		return 1.1
	}
	sort.Float64s(nn)
	return clamp(0.4*nn[len(nn)/2], 0.5, 1.1)
}

// markShapes returns the symbol of a station with the given verdict at p,
// radius r (mm): an open circle with a centre dot when ok, an open triangle
// when it warns, and a circle struck through by a heavy X when blocked.
func markShapes(s planner.Verdict, p Pt, r float64) []Shape {
	switch s {
	case planner.OK:
		return []Shape{circle(StyleMark, p, r), circle(StyleSolid, p, r*0.3)}
	case planner.Warn:
		t := r * 1.3
		return []Shape{poly(StyleMark, []Pt{
			{p.X, p.Y - t},
			{p.X + t*math.Sqrt(3)/2, p.Y + t/2},
			{p.X - t*math.Sqrt(3)/2, p.Y + t/2},
		})}
	default:
		x := r * 1.05
		return []Shape{
			circle(StyleMark, p, r),
			line(StyleStrike, Pt{p.X - x, p.Y - x}, Pt{p.X + x, p.Y + x}),
			line(StyleStrike, Pt{p.X - x, p.Y + x}, Pt{p.X + x, p.Y - x}),
		}
	}
}
