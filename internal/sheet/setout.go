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
		title: "SET-OUT TABLE — base (pole or microphone on the " + b.ground() + ") from the datum; two tapes from the nearest " + b.ground() + " marks that cross at 30° or more (shallower tapes fix a point poorly), else a tape and a square offset: walk from the mark along the line to the other mark (toward or away from it), then square off left or right (or set X and Y by total station); " +
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
		tp := baseFix(pr, refs, s.Base)
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

// minCrossing is the least angle at which two tapes may cross to fix a
// point: two tapes meeting at a shallow angle fix it poorly along their
// bisector (common practice for trilateration: 30° to 150°).
const minCrossing = 30 * math.Pi / 180

// baseFix returns the two fixes of the base at p for the set-out table: two
// tapes from marks that cross at minCrossing or more, the shortest such
// pair ("A: 5.000", "C: 8.000"); where no pair of marks does, a tape from
// the nearest and a square offset from the line through it and the mark
// farthest from it ("P1 away from E0: 10.000, offset 0.500 left": walk
// from P1 along the line, away from E0, then square off to the left); with
// one mark alone, its tape and
// the base's X and Y from the datum. A base on a mark is "at mark A", "on
// the mark: no tape".
func baseFix(pr printer, refs []floorRef, p orb.Point) [2]string {
	cs := make([]refDist, len(refs))
	for i, r := range refs {
		cs[i] = refDist{r, math.Hypot(r.at[0]-p[0], r.at[1]-p[1])}
	}
	sort.SliceStable(cs, func(i, j int) bool { return cs[i].d < cs[j].d })
	if len(cs) == 0 {
		return [2]string{"-", "square offset: X and Y from the datum"}
	}
	if atMark(cs[0].d) {
		return [2]string{"at mark " + cs[0].r.name, "on the mark: no tape"}
	}
	tape := func(c refDist) string { return c.r.name + ": " + pr.cell(c.d) }
	best, bi, bj := math.Inf(1), -1, -1
	for i := range cs {
		for j := i + 1; j < len(cs); j++ {
			a, c := cs[i], cs[j]
			if atMark(c.d) {
				continue
			}
			ux, uy := a.r.at[0]-p[0], a.r.at[1]-p[1]
			vx, vy := c.r.at[0]-p[0], c.r.at[1]-p[1]
			if math.Abs(ux*vy-uy*vx)/(a.d*c.d) < math.Sin(minCrossing) {
				continue // within 30° of one line
			}
			if c.d < best {
				best, bi, bj = c.d, i, j // the pair whose longer tape is shortest
			}
		}
	}
	if bi >= 0 {
		return [2]string{tape(cs[bi]), tape(cs[bj])}
	}
	if len(cs) == 1 {
		return [2]string{tape(cs[0]), "square offset: X and Y from the datum"}
	}
	// a square offset from the line through the nearest mark and the
	// farthest from it among the others, for a long base line
	a := cs[0]
	far := cs[1]
	for _, c := range cs[1:] {
		if math.Hypot(c.r.at[0]-a.r.at[0], c.r.at[1]-a.r.at[1]) > math.Hypot(far.r.at[0]-a.r.at[0], far.r.at[1]-a.r.at[1]) {
			far = c
		}
	}
	// walk from the nearest mark along the line, toward the other mark or
	// away from it, then square off to the left or right
	l := math.Hypot(far.r.at[0]-a.r.at[0], far.r.at[1]-a.r.at[1])
	ux, uy := (far.r.at[0]-a.r.at[0])/l, (far.r.at[1]-a.r.at[1])/l
	dx, dy := p[0]-a.r.at[0], p[1]-a.r.at[1]
	way := "toward"
	if dx*ux+dy*uy < 0 {
		way, ux, uy = "away from", -ux, -uy
	}
	along, off := dx*ux+dy*uy, ux*dy-uy*dx
	side := "left"
	if off < 0 {
		side = "right"
	}
	return [2]string{tape(a), fmt.Sprintf("%s %s %s: %s, offset %s %s", a.r.name, way, far.r.name, pr.cell(along), pr.cell(math.Abs(off)), side)}
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
