package sheet

import (
	"fmt"
	"math"
	"sort"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/planner"
)

// floorRef is a point on the floor a tape is pulled from: a floor mark of
// the layout or the datum.
type floorRef struct {
	name string
	at   orb.Point
}

// floorRefs returns the floor marks, and the datum when it is not one of
// them.
func (b *builder) floorRefs() []floorRef {
	var out []floorRef
	datum := false
	for _, m := range b.req.Cell.Marks {
		out = append(out, floorRef{m.Name, m.At})
		datum = datum || (m.At[0] == 0 && m.At[1] == 0)
	}
	if !datum {
		out = append(out, floorRef{"datum", orb.Point{0, 0}})
	}
	return out
}

// setOutTable returns the set-out table: one row per stand (or flush
// microphone) in plan order, with what a technician marks and sets: the
// base position from the datum, tapes from the two nearest floor marks, the
// microphone height, the boom's direction and length, the aim, and boxes
// to tick when set and when measured as built.
func (b *builder) setOutTable() tableSpec {
	pr := b.pr
	u := "(" + pr.lenUnit() + ")"
	t := tableSpec{
		name: "setout",
		title: "SET-OUT TABLE — base (pole or microphone on the " + b.ground() + ") from the datum; tapes from the two nearest " + b.ground() + " marks to the base; " +
			"boom direction as a bearing from +X, counter-clockwise seen from above; work down the table and tick each box",
		heads: []string{"Stand", "Base X " + u, "Base Y " + u, "Tape 1 (from mark)", "Tape 2 (from mark)", "Mic height " + u, "Boom", "Aim", "Set", "As built"},
	}
	n := len(t.heads)
	t.right = make([]bool, n)
	t.flex = make([]bool, n)
	for _, i := range []int{1, 2, 5} {
		t.right[i] = true
	}
	t.flex[6], t.flex[7] = true, true
	refs := b.floorRefs()
	for i := range b.plan.Stations {
		s := &b.plan.Stations[i]
		tp := [2]string{"-", "-"}
		for k, c := range nearestRefs(refs, s.Base) {
			tp[k] = c.r.name + ": " + pr.cell(c.d)
		}
		boom := "-"
		if s.Stand != nil && s.Stand.BoomLength > 0 {
			dx, dy := s.Mic.X-s.Base[0], s.Mic.Y-s.Base[1]
			bear := math.Mod(math.Atan2(dy, dx)*180/math.Pi+360, 360)
			boom = fmt.Sprintf("%s toward %s°", pr.length(math.Hypot(dx, dy)), fixed(bear, 0))
		}
		set, built := "[  ]", "[  ]"
		if s.Status == planner.Blocked {
			set, built = "DO NOT SET", "-"
		}
		t.rows = append(t.rows, []string{
			s.ID, pr.cell(s.Base[0]), pr.cell(s.Base[1]), tp[0], tp[1], pr.cell(s.Height), boom, b.aimWords(s), set, built,
		})
	}
	return t
}

// refDist is a floor reference with its distance from a point, m.
type refDist struct {
	r floorRef
	d float64
}

// nearestRefs returns the two floor references nearest to p, nearest
// first; one whose direction from p is within 10° of the first's (or
// opposite it) is passed over, since two tapes along one line fix no
// position.
func nearestRefs(refs []floorRef, p orb.Point) []refDist {
	cs := make([]refDist, len(refs))
	for i, r := range refs {
		cs[i] = refDist{r, math.Hypot(r.at[0]-p[0], r.at[1]-p[1])}
	}
	sort.SliceStable(cs, func(i, j int) bool { return cs[i].d < cs[j].d })
	var out []refDist
	for _, c := range cs {
		if len(out) == 1 {
			a := out[0]
			if a.d > 0 && c.d > 0 {
				ux, uy := a.r.at[0]-p[0], a.r.at[1]-p[1]
				vx, vy := c.r.at[0]-p[0], c.r.at[1]-p[1]
				if math.Abs(ux*vy-uy*vx)/(a.d*c.d) < math.Sin(10*math.Pi/180) {
					continue
				}
			}
		}
		out = append(out, c)
		if len(out) == 2 {
			break
		}
	}
	return out
}

// aimWords says in a few words how station s is aimed.
func (b *builder) aimWords(s *planner.Station) string {
	switch {
	case s.Kind == planner.Probes:
		return "its own procedure"
	case s.Stand == nil && s.Height < 0.005:
		return "flat, diaphragm up"
	}
	at := "aim point (steps)"
	if r3.Norm(r3.Sub(s.AimAt, b.req.Exit.Exit)) < 1e-3 {
		at = "nozzle exit"
	}
	if s.Incidence == planner.GrazingIncidence {
		return "edge-on to " + at
	}
	return "at " + at
}
