package sheet

import (
	"fmt"
	"math"
	"strings"

	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
	"arcwright/internal/planner"
	"arcwright/internal/units"
)

// steps returns the set-up steps in words, specific to the plan.
func (b *builder) steps() []textLine {
	pr := b.pr
	var out []textLine
	n := 0
	step := func(title string) {
		n++
		out = append(out, textLine{text: fmt.Sprintf("%d. %s", n, title), bold: true, space: 1.2})
	}
	say := func(format string, a ...any) {
		out = append(out, textLine{text: fmt.Sprintf(format, a...), indent: 3})
	}
	c := &b.req.Cell
	fr := b.req.Exit

	g := b.ground()
	step("Datum and " + g + " marks")
	say("Mark the datum (0, 0) on the %s. X and Y run as the reference arrows on sheet 1 show; every position below is measured from the datum.", g)
	if len(c.Marks) == 0 {
		say("No %s marks are given: check the datum against the cell drawing before marking anything.", g)
	}
	for _, m := range c.Marks {
		if d := math.Hypot(m.At[0], m.At[1]); !atMark(d) {
			say("Check mark %s: X %s, Y %s, %s from the datum by tape.", m.Name, pr.length(m.At[0]), pr.length(m.At[1]), pr.length(d))
		} else {
			say("Mark %s is at the datum.", m.Name)
		}
	}

	step("Nozzle exit and jet axis")
	// a round distance in the sheet's unit: 5 m, or 20 ft
	far := 5.0
	if !pr.metric() {
		far = 20 * units.Foot
	}
	p5 := fr.ToCell(geometry.JetPoint{X: far})
	say("The nozzle exit centre is above the %s point X %s, Y %s, at %s above the %s. The jet axis is horizontal, heading %s from +X (counter-clockwise seen from above).",
		g, pr.length(fr.Exit.X), pr.length(fr.Exit.Y), pr.length(fr.Exit.Z), g, degSign(fr.Heading))
	say("%s from the point under the exit to X %s, Y %s (%s downstream); check it by plumb from the nozzle centre.",
		b.markLine("Mark the axis on the "+g), pr.length(p5.X), pr.length(p5.Y), pr.length(far))

	for i := range b.plan.Arrays {
		ar := &b.plan.Arrays[i]
		ss := b.byArray[ar.Name]
		if len(ss) == 0 {
			continue
		}
		stand := "microphones flush on the " + g
		if ss[0].Stand != nil {
			stand = "stand " + ss[0].Stand.Name
		}
		step(fmt.Sprintf("%s %s (%s, %s)", strings.ToUpper(ar.Kind.String()[:1])+ar.Kind.String()[1:], ar.Name, plural(len(ss), "station"), stand))
		switch ar.Kind {
		case planner.Arc:
			b.arcSteps(ar, ss, say)
		case planner.Line:
			b.lineSteps(ar, ss, say)
		case planner.NearField:
			say("The line follows the predicted plume edge at %s clearance. Mark each station by its X and Y from the table; distances between neighbours: %s.",
				pr.length(ar.Spec.Clearance), strings.Join(runs(ss, spacingAlong(ss), pr), "; "))
		case planner.Ring:
			xr := r3.Dot(r3.Sub(ar.Centre, fr.Exit), fr.Axis())
			say("The ring is centred on the jet axis %s downstream of the exit (%s point X %s, Y %s), radius %s about the axis. Set each station at its azimuth and height:",
				pr.length(xr), g, pr.length(ar.Centre.X), pr.length(ar.Centre.Y), pr.length(ar.Radius))
			for _, s := range ss {
				say("%s: azimuth %s, X %s, Y %s, height %s.", s.ID, degSign(s.Jet.Azimuth), pr.length(s.Mic.X), pr.length(s.Mic.Y), pr.length(s.Height))
			}
		default:
			say("Place each by its X, Y and height:")
			for _, s := range ss {
				say("%s: X %s, Y %s, height %s.", s.ID, pr.length(s.Mic.X), pr.length(s.Mic.Y), pr.length(s.Height))
			}
		}
		b.standSteps(ss, say)
		b.aimSteps(ss, say)
		b.statusSteps(ss, say)
	}

	step("Cables")
	say("Route every cable along the %s outside the zones and their margins (dotted on the plan); cross the jet axis only upstream of the nozzle exit. Tape cables down and secure stands against the flow.", g)

	step("Checks before every run")
	say("Re-measure the clearance of every stand near a zone or wall against the station table.")
	say("Nothing loose inside the zones or margins: tools, tape, covers, paper.")
	say("Blocked stations removed; warnings reviewed by the test engineer.")
	say("Everyone out of the cell, doors shut, headcount done; hearing protection on for anyone near the cell.")
	return out
}

// arcSteps describes marking an arc: centre, radius, chords, heights.
func (b *builder) arcSteps(ar *planner.ArrayResult, ss []*planner.Station, say func(string, ...any)) {
	pr := b.pr
	fr := b.req.Exit
	xc := r3.Dot(r3.Sub(ar.Centre, fr.Exit), fr.Axis())
	if atMark(xc) {
		say("Mark the centre on the jet axis below the nozzle exit: X %s, Y %s from the datum.", pr.length(ar.Centre.X), pr.length(ar.Centre.Y))
	} else {
		say("Mark the centre on the jet axis, %s downstream of the exit: X %s, Y %s from the datum.", pr.length(xc), pr.length(ar.Centre.X), pr.length(ar.Centre.Y))
	}
	if flat(ss) {
		say("Swing radius %s from the centre with a tape held level (the arc is in plan).", pr.length(ar.Radius))
	} else {
		say("The arc is not level (radius %s about the centre, in a tilted plane): set each station by its X, Y and height from the table, and check its distance from the centre point on the axis.",
			pr.length(ar.Radius))
	}
	s0 := ss[0]
	say("Mark %s first at polar %s: X %s, Y %s.", s0.ID, degSign(setOut(s0)), pr.length(s0.Mic.X), pr.length(s0.Mic.Y))
	chords := make([]float64, len(ss)-1)
	for i := range chords {
		chords[i] = 2 * ar.Radius * math.Sin(math.Abs(setOut(ss[i+1])-setOut(ss[i]))/2)
	}
	if len(chords) > 0 {
		say("Then mark each station by its chord (2R·sin(half the angle step)) from the one before: %s.", strings.Join(runs(ss, chords, pr), "; "))
		last := ss[len(ss)-1]
		say("Check the last, %s: X %s, Y %s.", last.ID, pr.length(last.Mic.X), pr.length(last.Mic.Y))
	}
	b.heightSteps(ss, say)
}

// lineSteps describes marking a sideline parallel to the axis.
func (b *builder) lineSteps(ar *planner.ArrayResult, ss []*planner.Station, say func(string, ...any)) {
	pr := b.pr
	first, last := ss[0], ss[len(ss)-1]
	side := "left"
	if first.Jet.Azimuth > math.Pi/2 && first.Jet.Azimuth < 3*math.Pi/2 {
		side = "right"
	}
	say("%s parallel to the jet axis, %s to the %s of the axis (looking downstream), from X %s, Y %s to X %s, Y %s.",
		b.markLine("Mark a line on the "+b.ground()), pr.length(ar.Radius), side, pr.length(first.Mic.X), pr.length(first.Mic.Y), pr.length(last.Mic.X), pr.length(last.Mic.Y))
	say("Mark %s at X %s, Y %s (%s downstream of the exit plane), then along the line: %s.",
		first.ID, pr.length(first.Mic.X), pr.length(first.Mic.Y), pr.length(first.Jet.X), strings.Join(runs(ss, spacingAlong(ss), pr), "; "))
	b.heightSteps(ss, say)
}

// heightSteps gives the microphone heights; microphones flush on the
// floor need none.
func (b *builder) heightSteps(ss []*planner.Station, say func(string, ...any)) {
	pr := b.pr
	flush := true
	for _, s := range ss {
		flush = flush && s.Stand == nil && s.Height < 0.005
	}
	if flush {
		say("The microphones lie flush on the %s: no heights to set.", b.ground())
		return
	}
	hs := make([]float64, len(ss))
	for i, s := range ss {
		hs[i] = s.Height
	}
	r := runs(ss, hs, pr)
	if len(r) == 1 {
		say("Set the microphone heights with a laser level from the %s: %s.", b.ground(), strings.TrimSuffix(strings.SplitN(r[0], ": ", 2)[1], " each step"))
		return
	}
	say("Set the microphone heights with a laser level from the %s: %s.", b.ground(), strings.ReplaceAll(strings.Join(r, "; "), " each step", " each"))
}

// standSteps tells where the bases of boom stands go.
func (b *builder) standSteps(ss []*planner.Station, say func(string, ...any)) {
	pr := b.pr
	var bases []string
	var st *planner.Stand
	for _, s := range ss {
		if s.Stand != nil && s.Stand.BoomLength > 0 {
			st = s.Stand
			bases = append(bases, s.ID)
		}
	}
	if st == nil {
		return
	}
	say("Stand %s has a %s boom: its pole stands on the side away from the jet and the boom reaches to the microphone. Set each base (%s) where the set-out table gives it, the boom pointing as the table says.",
		st.Name, pr.length(st.BoomLength), idRangeOf(bases))
}

// aimSteps tells how to aim the microphones.
func (b *builder) aimSteps(ss []*planner.Station, say func(string, ...any)) {
	pr := b.pr
	type group struct {
		at  r3.Vec
		inc planner.Incidence
		ids []*planner.Station
	}
	var gs []group
	for _, s := range ss {
		if k := len(gs) - 1; k >= 0 && gs[k].inc == s.Incidence && r3.Norm(r3.Sub(gs[k].at, s.AimAt)) < 1e-3 {
			gs[k].ids = append(gs[k].ids, s)
			continue
		}
		gs = append(gs, group{at: s.AimAt, inc: s.Incidence, ids: []*planner.Station{s}})
	}
	for _, g := range gs {
		who := "each microphone"
		if len(gs) > 1 || g.ids[0].Kind == planner.Probes {
			who = idRange(g.ids)
		}
		where := fmt.Sprintf("X %s, Y %s, height %s", pr.length(g.at.X), pr.length(g.at.Y), pr.length(g.at.Z))
		if r3.Norm(r3.Sub(g.at, b.req.Exit.Exit)) < 1e-3 {
			where += " (the nozzle exit centre)"
		}
		probe := g.ids[0].Kind == planner.Probes
		flush := g.ids[0].Stand == nil && g.ids[0].Height < 0.005
		switch {
		case probe:
			say("Set %s as its own procedure says: the plan checks its clearance, not its aim.", who)
		case flush:
			say("Lay %s flat on the %s, diaphragm up, so that the source at %s is at grazing incidence; turn its cable away from the jet.", who, b.ground(), where)
		case g.inc == planner.GrazingIncidence:
			say("Aim %s with its diaphragm edge-on to the aim point %s (grazing incidence).", who, where)
		default:
			say("Aim %s at %s, the diaphragm facing it (normal incidence).", who, where)
		}
	}
}

// statusSteps lists the stations not to set and those to look at.
func (b *builder) statusSteps(ss []*planner.Station, say func(string, ...any)) {
	var bl, wa []string
	for _, s := range ss {
		switch s.Status {
		case planner.Blocked:
			bl = append(bl, s.ID)
		case planner.Warn:
			wa = append(wa, s.ID)
		}
	}
	if len(bl) > 0 {
		say("Do NOT set %s: blocked (reasons in the station table). Mark the %s points only if the chord chain needs them.", joinAnd(bl), b.ground())
	}
	if len(wa) > 0 {
		say("Check with the test engineer before setting %s: warning (see the table).", joinAnd(wa))
	}
}

// ground names what the stations stand on: "ground" on an outdoor pad,
// "floor" in a cell.
func (b *builder) ground() string {
	if b.req.Cell.Kind == geometry.OutdoorPad {
		return "ground"
	}
	return "floor"
}

// atMark reports whether a distance d (m) between two marks is nil as a
// tape reads it (below 1/16 in, 1.6 mm): the marks are one.
func atMark(d float64) bool { return math.Abs(d) < units.Inch/16 }

// markLine returns the words for marking a line on the floor: chalk on a
// hard floor or the ground, tape or a string line on a treated (grating or
// wedge) floor. what is the verb phrase ("Mark the axis on the floor").
func (b *builder) markLine(what string) string {
	if b.req.Cell.Floor == geometry.Treated {
		return what + " (tape on the grating, or a string line)"
	}
	return what + " (a chalk line)"
}

// flat reports whether the stations lie at one height (within 1 mm).
func flat(ss []*planner.Station) bool {
	for _, s := range ss {
		if math.Abs(s.Mic.Z-ss[0].Mic.Z) > 1e-3 {
			return false
		}
	}
	return true
}

// spacingAlong returns the plan distances between neighbouring stations.
func spacingAlong(ss []*planner.Station) []float64 {
	out := make([]float64, max(0, len(ss)-1))
	for i := range out {
		out[i] = math.Hypot(ss[i+1].Mic.X-ss[i].Mic.X, ss[i+1].Mic.Y-ss[i].Mic.Y)
	}
	return out
}

// runs groups neighbouring equal values (as printed) into runs:
// "A-01 → A-13: 0.611 m each step". len(vals) is len(ss)−1 for steps
// between stations, or len(ss) for a value per station.
func runs(ss []*planner.Station, vals []float64, pr printer) []string {
	var out []string
	perStation := len(vals) == len(ss)
	for i := 0; i < len(vals); {
		v := pr.length(vals[i])
		j := i
		for j+1 < len(vals) && pr.length(vals[j+1]) == v {
			j++
		}
		switch {
		case perStation && i == j:
			out = append(out, fmt.Sprintf("%s: %s", ss[i].ID, v))
		case perStation:
			out = append(out, fmt.Sprintf("%s to %s: %s each step", ss[i].ID, ss[j].ID, v))
		case i == j:
			out = append(out, fmt.Sprintf("%s -> %s: %s", ss[i].ID, ss[i+1].ID, v))
		default:
			out = append(out, fmt.Sprintf("%s -> %s: %s each step", ss[i].ID, ss[j+1].ID, v))
		}
		i = j + 1
	}
	return out
}

// idRangeOf prints a list of IDs as "A-01 to A-13" when long.
func idRangeOf(ids []string) string {
	if len(ids) > 2 {
		return ids[0] + " to " + ids[len(ids)-1]
	}
	return joinAnd(ids)
}

// idRange prints the IDs of neighbouring stations as "A-01 to A-05", or a
// list.
func idRange(ss []*planner.Station) string {
	if len(ss) == 1 {
		return ss[0].ID
	}
	if len(ss) > 2 {
		return ss[0].ID + " to " + ss[len(ss)-1].ID
	}
	return ss[0].ID + " and " + ss[1].ID
}

// setOut returns the polar angle a station is set out at on the floor: the
// arc's requested angle where there is one (a microphone on the floor below
// the axis sees the source at a slightly different angle, which the station
// table gives), else the angle seen from the array's centre.
func setOut(s *planner.Station) float64 {
	if !math.IsNaN(s.Nominal) {
		return s.Nominal
	}
	return s.Polar
}
