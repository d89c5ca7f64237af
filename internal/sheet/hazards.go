package sheet

import (
	"math"
	"sort"
	"strings"

	"github.com/paulmach/orb"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
	"arcwright/internal/planner"
)

// hazard is a place on the plan where the exhaust stops being a free jet,
// as the planner reports it: where a zone of one or more operating points
// reaches the floor, the ceiling, the boundary or an obstacle
// (Plan.Impingements; the zones the surfaces carry on, Plan.Attached,
// start at the same contacts), where buoyancy starts to bend the jet, where
// the collector does not capture the plume (at its inlet, Capture warn or
// blocked), or where a crew position stands inside a zone. The planner's warnings say
// the same in words; the sheet marks the place and draws nothing the
// planner does not report (no contact beyond a capturing collector).
type hazard struct {
	at   orb.Point // cell frame, m
	text string
}

// hazardMerge is how close on paper (mm) the places of one kind of
// hazard of different operating points are marked by one triangle, which
// stands at the first of them (the most upstream).
const hazardMerge = 5.0

// hazards returns the places to mark, one per kind of hazard and cluster
// of places within merge (m) of the first of the cluster, in the order of
// the planner's reports.
func (b *builder) hazards(merge float64) []hazard {
	c := &b.req.Cell
	fr := b.req.Exit
	floor, walls, meetsWalls := "floor", "walls", ": wall jet"
	if c.Kind == geometry.OutdoorPad {
		floor, walls, meetsWalls = "ground", "site limit", ""
	}
	type place struct {
		kind  string // what happens, without the points
		point string
		x     float64 // order along the jet, m
		at    orb.Point
	}
	var ps []place
	zoneName := func(z jet.Zone) string {
		if z == jet.HotZone {
			return "hot zone"
		}
		return "velocity zone"
	}
	for _, im := range b.plan.Impingements {
		z := zoneName(im.Zone)
		var kind string
		switch im.Surface {
		case planner.SurfaceFloor:
			kind = z + " meets the " + floor + ": wall jet"
		case planner.SurfaceCeiling:
			kind = z + " meets the ceiling: wall jet"
		case planner.SurfaceBoundary:
			kind = z + " reaches the " + walls + meetsWalls
		case planner.SurfaceObstacle:
			kind = z + " strikes " + im.Obstacle + ": wall jet"
		default:
			kind = z + " reaches the " + im.Surface
		}
		at := im.At
		if im.Surface == planner.SurfaceObstacle {
			at = b.onObstacle(im.Obstacle, at)
		}
		ps = append(ps, place{kind, im.Point, im.X, at})
	}
	for k := range b.plan.Points {
		p := &b.plan.Points[k]
		if p.Plume == nil || !jet.Has(p.Flags, jet.FlagBuoyant) {
			continue
		}
		bu := p.Plume.Buoyancy()
		if !finite(bu.Onset) {
			continue
		}
		dir := "up"
		if bu.ReducedGravity < 0 {
			dir = "down"
		}
		a := fr.ToCell(geometry.JetPoint{X: bu.Onset})
		// the collector takes a captured plume before it bends; beyond the
		// walls there is nothing to mark (an outdoor site limit is not a
		// wall: the jet bends beyond it all the same)
		if col := c.Collector; col != nil && p.Capture != planner.Blocked && bu.Onset >= b.axial(col.Inlet) {
			continue
		}
		if b.walled() && !c.Contains(orb.Point{a.X, a.Y}) {
			continue
		}
		ps = append(ps, place{"buoyancy bends the jet " + dir + " beyond here", p.Name, bu.Onset, orb.Point{a.X, a.Y}})
	}
	// a capture warning is marked at the collector inlet, where the plume
	// meets (or misses) the collector
	if col := c.Collector; col != nil {
		for k := range b.plan.Points {
			p := &b.plan.Points[k]
			var kind string
			switch p.Capture {
			case planner.OK:
				continue
			case planner.Blocked:
				kind = "collector capture blocked: exhaust will spill into the cell"
			default:
				kind = "collector capture warn: the plume's edge may spill past the inlet"
			}
			ps = append(ps, place{kind, p.Name, b.axial(col.Inlet), orb.Point{col.Inlet.X, col.Inlet.Y}})
		}
	}
	seenCrew := map[string]bool{}
	for _, e := range b.plan.Crew {
		if !e.InZone || seenCrew[e.Name] {
			continue
		}
		seenCrew[e.Name] = true
		ps = append(ps, place{"crew position " + e.Name + " is inside a zone: no one may stand here during runs", "", math.Inf(1), orb.Point{e.At.X, e.At.Y}})
	}
	// cluster the places of one kind, upstream first
	var kinds []string
	byKind := map[string][]place{}
	for _, p := range ps {
		if _, ok := byKind[p.kind]; !ok {
			kinds = append(kinds, p.kind)
		}
		byKind[p.kind] = append(byKind[p.kind], p)
	}
	var out []hazard
	for _, k := range kinds {
		l := byKind[k]
		sort.SliceStable(l, func(i, j int) bool { return l[i].x < l[j].x })
		used := make([]bool, len(l))
		for i := range l {
			if used[i] {
				continue
			}
			var names []string
			for j := i; j < len(l); j++ {
				if !used[j] && math.Hypot(l[j].at[0]-l[i].at[0], l[j].at[1]-l[i].at[1]) <= merge {
					used[j] = true
					if l[j].point != "" {
						names = append(names, l[j].point)
					}
				}
			}
			text := k
			if len(names) > 0 {
				text = b.pointNames(names) + ": " + k
			}
			out = append(out, hazard{l[i].at, text})
		}
	}
	return mergeOverlapping(out, hazardOverlap*merge/hazardMerge)
}

// hazardOverlap is how close on paper (mm) two marks of different kinds
// stand before they become one triangle with both texts: closer, the
// triangles (3.6 mm wide) would overlap.
const hazardOverlap = 3.6

// mergeOverlapping joins each hazard within d (m) of an earlier one to it:
// one mark, the texts joined with "; " (the second's point names dropped
// when they repeat the first's).
func mergeOverlapping(hs []hazard, d float64) []hazard {
	var out []hazard
	for _, h := range hs {
		joined := false
		for i := range out {
			if math.Hypot(h.at[0]-out[i].at[0], h.at[1]-out[i].at[1]) <= d {
				t := h.text
				if a, _, ok := strings.Cut(out[i].text, ": "); ok {
					if b, rest, ok := strings.Cut(t, ": "); ok && a == b {
						t = rest
					}
				}
				out[i].text += "; " + t
				joined = true
				break
			}
		}
		if !joined {
			out = append(out, h)
		}
	}
	return out
}

// onObstacle returns the point of the footprint of the obstacle named name
// nearest to p (cell frame, m): the planner places a strike on the axis
// where the zone first comes near the obstacle; the mark goes on the
// obstacle. p itself when it is inside the footprint or there is no such
// obstacle.
func (b *builder) onObstacle(name string, p orb.Point) orb.Point {
	for _, o := range b.req.Cell.Obstacles {
		if o.Name != name {
			continue
		}
		if o.Footprint.Contains(p) {
			return p
		}
		ring := o.Footprint.Ring
		if ring == nil {
			ring = o.Footprint.Outline(72)
		}
		best, bd := p, math.Inf(1)
		for i := 0; i+1 < len(ring); i++ {
			q := nearestOnSegment(p, ring[i], ring[i+1])
			if d := math.Hypot(q[0]-p[0], q[1]-p[1]); d < bd {
				best, bd = q, d
			}
		}
		return best
	}
	return p
}

// nearestOnSegment returns the point of segment ab nearest to p.
func nearestOnSegment(p, a, b orb.Point) orb.Point {
	dx, dy := b[0]-a[0], b[1]-a[1]
	l := dx*dx + dy*dy
	if l == 0 {
		return a
	}
	t := clamp(((p[0]-a[0])*dx+(p[1]-a[1])*dy)/l, 0, 1)
	return orb.Point{a[0] + t*dx, a[1] + t*dy}
}

// pointNames names operating points in the plan's order: "P-150, P-185",
// or "all 14 points" when they are all of more than six.
func (b *builder) pointNames(names []string) string {
	set := map[string]bool{}
	for _, n := range names {
		set[n] = true
	}
	var ordered []string
	for k := range b.plan.Points {
		if n := b.plan.Points[k].Name; set[n] {
			ordered = append(ordered, n)
			delete(set, n)
		}
	}
	for _, n := range names {
		if set[n] {
			ordered = append(ordered, n)
			delete(set, n)
		}
	}
	if len(ordered) > 6 && len(ordered) == len(b.plan.Points) {
		return "all " + plural(len(ordered), "point")
	}
	return strings.Join(ordered, ", ")
}

// hazardMarks draws the warning triangle at every hazard inside the frame
// and places its words beside it; a hazard outside the frame or without
// room for its words is listed in the notes.
func (v *planView) hazardMarks() {
	for _, h := range v.b.hazards(hazardMerge * float64(v.scale) / 1000) {
		p := v.t.pt(h.at[0], h.at[1])
		if p.X < v.frame.X+2 || p.X > v.frame.Right()-2 || p.Y < v.frame.Y+2 || p.Y > v.frame.Bottom()-2 {
			v.notes = append(v.notes, "Outside the frame: "+h.text+".")
			continue
		}
		v.b.hazardsDrawn = append(v.b.hazardsDrawn, h)
		v.shapes = append(v.shapes, warningTriangle(p, 1.8)...)
		v.pl.block(rectAround(p, 1.8))
		v.hazardLabels = append(v.hazardLabels, callout{text: h.text, anchor: p, dir: Pt{0.4, -1}, clear: 1.9, far: []float64{2, 4, 7, 11, 16}, kind: FeatureLabel, of: "warning", note: "At the warning triangle: " + h.text + "."})
	}
}

// warningTriangle returns the plan's hazard mark: a triangle in the safety
// panel's orange with a black outline and an exclamation mark, centred on
// p, side 2·s mm.
func warningTriangle(p Pt, s float64) []Shape {
	h := s * math.Sqrt(3)
	top, bl, br := Pt{p.X, p.Y - h*2/3}, Pt{p.X - s, p.Y + h/3}, Pt{p.X + s, p.Y + h/3}
	return []Shape{
		poly(StyleHazard, []Pt{top, br, bl}),
		line(StyleStrike, Pt{p.X, p.Y - h*0.38}, Pt{p.X, p.Y + h*0.05}),
		circle(StyleSolid, Pt{p.X, p.Y + h*0.2}, 0.18),
	}
}
