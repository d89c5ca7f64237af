package sheet

import (
	"fmt"
	"math"
	"regexp"
	"slices"
	"strconv"
	"strings"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
	"arcwright/internal/planner"
)

// Sheet 1 carries every safety warning of the plan: the warnings about
// the exhaust (a zone reaching a surface or an obstacle and running on as a
// wall jet, a zone reaching the boundary, buoyancy bending the jet, the
// collector not taking the plume) and about people (a crew position inside
// a zone or past a noise exposure limit). The other warnings (the
// atmosphere's range, a laminar jet, an assumed room absorption, how a
// coaxial jet's noise is bounded) go on sheet 1 when there is room. A
// warning repeated for several operating points is one line naming the
// points; every warning is printed in full on a later sheet.

// warnLine is one line of the warnings panel of sheet 1 and the plan's
// warnings (indices in Plan.Warnings) that it stands for.
type warnLine struct {
	text   string
	of     []int
	safety bool
}

// The safety warnings the planner writes, by kind.
var (
	reImpinge = regexp.MustCompile(`^(.+?): the (velocity zone|hot zone) (reaches the .+?|strikes the obstacle .+?) about .+? downstream of the exit: `)
	reBuoyant = regexp.MustCompile(`^(.+?): buoyant: .*? bend the jet (up|down)`)
	reCapture = regexp.MustCompile(`^(.+?): collector capture (warn|blocked): `)
	rePercent = regexp.MustCompile(`\((\d+) % of the inlet\)`)
	reCrew    = regexp.MustCompile(`^crew position (.+?), (.+?)(?: \(and \d+ other points?\))?: (.*)$`)
	reLevel   = regexp.MustCompile(`^(\d+) dB\(A\)`)
)

// isSafety reports whether a warning of the plan is a safety warning
// (see above): the kinds the planner writes, and for any other wording
// the words of a hazard to people.
func isSafety(w string) bool {
	if reImpinge.MatchString(w) || reBuoyant.MatchString(w) || reCapture.MatchString(w) || reCrew.MatchString(w) {
		return true
	}
	l := strings.ToLower(w)
	for _, k := range []string{"wall jet", "strikes", "no one may", "hearing protect", "exposure limit", "spill into the cell"} {
		if strings.Contains(l, k) {
			return true
		}
	}
	return false
}

// warningLines returns the lines of the warnings panel of sheet 1: the
// safety warnings first, those of one kind for several operating points
// grouped into one line that names the points, then the others as they
// are.
func (b *builder) warningLines() []warnLine {
	type group struct {
		kind   string
		points []string
		of     []int
		xs     []float64 // distances along the jet, m, or percentages
		names  []string  // the obstacles struck, in order, once each
	}
	var order []string
	groups := map[string]*group{}
	add := func(key, point string, i int, x float64) {
		g, ok := groups[key]
		if !ok {
			g = &group{kind: key}
			groups[key] = g
			order = append(order, key)
		}
		g.points = append(g.points, point)
		g.of = append(g.of, i)
		if !math.IsNaN(x) {
			g.xs = append(g.xs, x)
		}
	}
	// where each point's zones reach what, from the planner's reports
	reach := map[string]float64{}
	floor, walls := "floor", "walls"
	if b.req.Cell.Kind == geometry.OutdoorPad {
		floor, walls = "ground", "site limit"
	}
	for _, im := range b.plan.Impingements {
		zone := "velocity zone"
		if im.Zone == jet.HotZone {
			zone = "hot zone"
		}
		what := map[string]string{planner.SurfaceFloor: "reaches the " + floor, planner.SurfaceBoundary: "reaches the " + walls,
			planner.SurfaceCeiling: "reaches the ceiling", planner.SurfaceObstacle: "strikes the obstacle " + im.Obstacle}[im.Surface]
		k := im.Point + "|" + zone + " " + what
		if _, ok := reach[k]; !ok {
			reach[k] = im.X
		}
	}
	onset := map[string]float64{}
	for k := range b.plan.Points {
		if p := &b.plan.Points[k]; p.Plume != nil {
			onset[p.Name] = p.Plume.Buoyancy().Onset
		}
	}
	var crew, noise []int
	var others []warnLine
	for i, w := range b.plan.Warnings {
		if m := reImpinge.FindStringSubmatch(w); m != nil {
			x, ok := reach[m[1]+"|"+m[2]+" "+m[3]]
			if !ok {
				x = math.NaN()
			}
			// the strikes of one zone on several obstacles are one line
			if o, ok := strings.CutPrefix(m[3], "strikes the obstacle "); ok {
				key := "strike|" + m[2]
				add(key, m[1], i, x)
				if g := groups[key]; !slices.Contains(g.names, o) {
					g.names = append(g.names, o)
				}
				continue
			}
			add("impinge|"+m[2]+" "+m[3], m[1], i, x)
		} else if m := reBuoyant.FindStringSubmatch(w); m != nil {
			x, ok := onset[m[1]]
			if !ok || !finite(x) {
				x = math.NaN()
			}
			add("buoyant|"+m[2], m[1], i, x)
		} else if m := reCapture.FindStringSubmatch(w); m != nil {
			x := math.NaN()
			if p := rePercent.FindStringSubmatch(w); p != nil {
				x, _ = strconv.ParseFloat(p[1], 64)
			}
			add("capture|"+m[2], m[1], i, x)
		} else if m := reCrew.FindStringSubmatch(w); m != nil {
			if strings.HasPrefix(m[3], "inside the") {
				crew = append(crew, i)
			} else {
				noise = append(noise, i)
			}
		} else if isSafety(w) {
			add("verbatim|"+strconv.Itoa(i), "", i, math.NaN())
		} else {
			others = append(others, warnLine{text: w, of: []int{i}})
		}
	}
	var out []warnLine
	for _, key := range order {
		g := groups[key]
		kind, what, _ := strings.Cut(g.kind, "|")
		pts := b.pointNames(g.points)
		var s string
		switch kind {
		case "impinge":
			s = fmt.Sprintf("%s: the %s%s: wall jet there; keep stations and cables clear", pts, what, b.downstream(g.xs))
			if strings.HasSuffix(what, "reaches the site limit") {
				// a site limit is a line on the ground, not a wall
				s = fmt.Sprintf("%s: the %s%s and runs on beyond it, off the site: keep people out there downstream", pts, what, b.downstream(g.xs))
			}
		case "strike":
			obs := "the obstacle " + g.names[0]
			if len(g.names) > 1 {
				obs = fmt.Sprintf("%d obstacles, %s,", len(g.names), joinAnd(g.names))
			}
			s = fmt.Sprintf("%s: the %s strikes %s%s: wall jet there; keep stations and cables clear", pts, what, obs, b.downstream(g.xs))
		case "buoyant":
			from := b.downstream(g.xs)
			if from != "" {
				from = " from" + from
			}
			s = fmt.Sprintf("%s: buoyancy bends the jet %s%s; the bent zones are checked too", pts, what, from)
		case "capture":
			pc := ""
			if len(g.xs) == len(g.of) {
				pc = " (" + numRange(g.xs, func(v float64) string { return strconv.FormatFloat(v, 'f', -1, 64) }) + " % of the inlet)"
			}
			if what == "blocked" {
				s = fmt.Sprintf("%s: collector capture BLOCKED: the plume does not fit the collector%s: exhaust will spill into the cell", pts, pc)
			} else {
				s = fmt.Sprintf("%s: collector capture warn: the edge of the plume spills past the collector%s", pts, pc)
			}
		default:
			s = b.plan.Warnings[g.of[0]]
		}
		out = append(out, warnLine{text: s, of: g.of, safety: true})
	}
	for _, i := range crew {
		m := reCrew.FindStringSubmatch(b.plan.Warnings[i])
		reason, _, _ := strings.Cut(m[3], ";")
		out = append(out, warnLine{text: "crew position " + m[1] + ": " + reason, of: []int{i}, safety: true})
	}
	if len(noise) > 0 {
		var names []string
		for _, i := range noise {
			m := reCrew.FindStringSubmatch(b.plan.Warnings[i])
			n := m[1]
			if l := reLevel.FindStringSubmatch(m[3]); l != nil {
				n += " (" + l[1] + " dB(A), " + m[2] + ")"
			} else {
				n += " (level not predicted, " + m[2] + ")"
			}
			names = append(names, n)
		}
		head := "crew position "
		if len(noise) > 1 {
			head = "crew positions "
		}
		out = append(out, warnLine{text: head + strings.Join(names, ", ") + ": past a noise limit: do not stay there during runs without hearing protection chosen under the site's hearing-conservation procedures", of: noise, safety: true})
	}
	return append(out, others...)
}

// downstream prints distances from the exit (m) as " about 10.4 m
// downstream of the exit" or " about 10.4 m to 12.0 m downstream of the
// exit"; "" for none.
func (b *builder) downstream(xs []float64) string {
	if len(xs) == 0 {
		return ""
	}
	return " about " + numRange(xs, b.pr.length) + " downstream of the exit"
}

// numRange prints the smallest and the largest of xs with f, once when they
// print the same.
func numRange(xs []float64, f func(float64) string) string {
	lo, hi := math.Inf(1), math.Inf(-1)
	for _, x := range xs {
		lo, hi = math.Min(lo, x), math.Max(hi, x)
	}
	a, z := f(lo), f(hi)
	if a == z {
		return a
	}
	return a + " to " + z
}
