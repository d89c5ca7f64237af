package sheet

import (
	"math"

	"github.com/paulmach/orb"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
)

// hazard is a place on the plan where a drawn zone stops being a free jet:
// where it meets the floor, the ceiling, the boundary or an obstacle (the
// exhaust turns into a wall jet there) or where buoyancy starts to bend it.
// The planner's warnings say the same in words; the sheet marks the place.
type hazard struct {
	at   orb.Point // cell frame, m
	text string
}

// hazards returns the places where the drawn zones (the governing point's
// velocity zone and the hot point's hot zone, conservative, without the
// margin) meet the floor, the ceiling, the boundary or an obstacle, first
// contact along each zone for each surface, and where buoyancy bends the
// jet of a drawn point before its zone ends.
func (b *builder) hazards() []hazard {
	c := &b.req.Cell
	fr := b.req.Exit
	z0 := fr.Exit.Z
	floor, walls := "floor", "walls"
	if c.Kind == geometry.OutdoorPad {
		floor, walls = "ground", "site limit"
	}
	var out []hazard
	axis := func(x float64) orb.Point {
		p := fr.ToCell(geometry.JetPoint{X: x})
		return orb.Point{p.X, p.Y}
	}
	for _, z := range []struct {
		name string
		o    zoneOutline
	}{{"velocity zone", b.zs.vel}, {b.hotName(), b.zs.hot}} {
		if z.o == nil {
			continue
		}
		seen := map[string]bool{}
		add := func(key string, h hazard) {
			if !seen[key] {
				seen[key] = true
				out = append(out, h)
			}
		}
		for _, q := range z.o {
			x, r := q[0], q[1]
			if r >= z0 {
				add("floor", hazard{axis(x), z.name + " meets the " + floor + ": wall jet"})
			}
			if finite(c.Ceiling) && r >= c.Ceiling-z0 {
				add("ceiling", hazard{axis(x), z.name + " meets the ceiling: wall jet"})
			}
			for _, az := range []float64{0, math.Pi} {
				p3 := fr.ToCell(geometry.JetPoint{X: x, R: r, Azimuth: az})
				p := orb.Point{p3.X, p3.Y}
				if c.Bounded() && !c.Contains(p) {
					add("walls", hazard{p, z.name + " meets the " + walls + ": wall jet"})
				}
				for _, ob := range c.Obstacles {
					if ob.ZMin <= z0+r && ob.ZMax >= z0-r && ob.Footprint.Contains(p) {
						add("obstacle "+ob.Name, hazard{p, z.name + " strikes " + ob.Name + ": wall jet"})
					}
				}
			}
		}
	}
	for _, i := range []int{b.plan.Governing, b.plan.GoverningHot} {
		p := &b.plan.Points[i]
		if !jet.Has(p.Flags, jet.FlagBuoyant) {
			continue
		}
		bu := p.Plume.Buoyancy()
		reach := math.Max(b.zs.velLen, b.zs.hotLen)
		if !(bu.Onset < reach) || !finite(bu.Onset) {
			continue
		}
		dir := "up"
		if bu.ReducedGravity < 0 {
			dir = "down"
		}
		out = append(out, hazard{axis(bu.Onset), "buoyancy bends the jet of " + p.Name + " " + dir + " beyond here"})
		if b.plan.Governing == b.plan.GoverningHot {
			break
		}
	}
	return out
}

// hazardMarks draws the warning triangle at every hazard inside the frame
// and places its words beside it; a hazard outside the frame or without
// room for its words is listed in the notes.
func (v *planView) hazardMarks() {
	for _, h := range v.b.hazards() {
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
