package sheet

import (
	"fmt"
	"strconv"
	"strings"

	"arcwright/internal/jet"
	"arcwright/internal/planner"
)

// stationTable returns the station table: one row per station, lengths in
// the layout's units, radius and polar angle both as the layout asks
// (nominal) and as placed, and the operating point of each clearance.
func (b *builder) stationTable() tableSpec {
	pr := b.pr
	u := "(" + pr.lenUnit() + ")"
	t := tableSpec{
		name: "stations",
		title: "STATION TABLE — X and Y from the datum, heights above the " + b.ground() + ", lengths in " + pr.lenUnit() +
			"; radius and polar angle nominal (as the layout asks) and as placed, the same quantity: arcs in the arc's plane, as marked; rings about the axis; lines, offset from the axis; near-field, clearance from the plume edge (CSV, JSON: acoustic_distance)" +
			"; clearances are the smallest over all operating points, each with the point that governs it; " + pr.convention(),
		heads: []string{"ID", "Ch", "Array", "Polar nominal (deg)", "Polar as placed (deg)", "Radius nominal " + u, "Radius as placed " + u,
			"Height " + u, "X " + u, "Y " + u,
			"Clearance velocity zone " + u, "Clearance hot zone " + u, "Clearance " + b.boundaryWord() + " " + u, "Status", "Reason"},
	}
	n := len(t.heads)
	t.right = make([]bool, n)
	t.flex = make([]bool, n)
	for i := 1; i <= 12; i++ {
		t.right[i] = i != 2
	}
	t.flex[n-1] = true
	for i := range b.plan.Stations {
		s := &b.plan.Stations[i]
		ch := "-"
		if s.Channel > 0 {
			ch = strconv.Itoa(s.Channel)
		}
		chk := func(name string, withPoint bool) string {
			c, ok := s.Check(name)
			if !ok {
				return "-"
			}
			v := pr.cell(c.Value)
			if withPoint && c.Point != "" && finite(c.Value) {
				v += " (" + c.Point + ")"
			}
			return v
		}
		status := s.Status.String()
		if s.Status == planner.Blocked {
			status = "BLOCKED"
		}
		nomPolar := "-"
		if finite(s.Nominal) {
			nomPolar = deg(s.Nominal)
		}
		nomR, placedR := "-", "-"
		if r := b.plan.NominalRadius(s); finite(r) {
			nomR, placedR = pr.cell(r), pr.cell(b.plan.PlacedRadius(s))
		}
		t.rows = append(t.rows, []string{
			s.ID, ch, s.Array, nomPolar, deg(b.plan.PlacedPolar(s)), nomR, placedR, pr.cell(s.Height), pr.cell(s.Mic.X), pr.cell(s.Mic.Y),
			chk(planner.CheckVelocity, true), chk(planner.CheckHot, true), chk(planner.CheckWall, false), status,
			strings.Join(s.Reasons, "; "),
		})
	}
	return t
}

// pointsTable returns the operating-points table.
func (b *builder) pointsTable() tableSpec {
	pr := b.pr
	l := func(m float64) string { return pr.short(m) }
	pair := func(a, c float64) string { return l(a) + " / " + l(c) }
	t := tableSpec{
		name: "points",
		title: fmt.Sprintf("OPERATING POINTS — ambient %s, %s, %.0f %% RH; zones bounded by %s and %s; nominal / conservative values; * marks the point drawn",
			pr.temp(b.req.Ambient.Temperature), pressure(b), b.req.Ambient.Humidity, pr.speed(b.lim.Velocity), pr.temp(b.lim.Temperature)),
		heads: []string{"Point", "NPR", "T0", "Mj", "Uj", "Tj", "Dj", "Core length", "Velocity zone length", "Velocity zone width",
			"Hot zone length", "Hot zone width", "Collector capture", "Regime flags"},
	}
	n := len(t.heads)
	t.right = make([]bool, n)
	t.flex = make([]bool, n)
	for i := 1; i <= 11; i++ {
		t.right[i] = true
	}
	t.flex[12], t.flex[13] = true, true
	for i := range b.plan.Points {
		p := &b.plan.Points[i]
		name := p.Name
		if i == b.plan.Governing {
			name += " *"
		}
		npr := fmt.Sprintf("%.2f", p.Condition.Primary.NPR)
		if s := p.Condition.Secondary; s != nil {
			npr += fmt.Sprintf(" / %.2f", s.NPR)
		}
		env := func(z jet.Zone, v jet.Variant) *jet.Envelope { return p.Plume.Envelope(z, v) }
		zl := func(z jet.Zone) string {
			a, c := env(z, jet.Nominal), env(z, jet.Conservative)
			if c.Length == 0 {
				return "none"
			}
			return pair(a.Length, c.Length)
		}
		zw := func(z jet.Zone) string {
			a, c := env(z, jet.Nominal), env(z, jet.Conservative)
			if c.Length == 0 {
				return "none"
			}
			return pair(2*a.MaxRadius, 2*c.MaxRadius)
		}
		capture := "no collector"
		if p.Capture != 0 {
			capture = p.Capture.String()
			if p.CaptureReason != "" {
				capture += ": " + p.CaptureReason
			}
		}
		t.rows = append(t.rows, []string{
			name, npr, pr.temp(p.Exit.TotalTemperature), fmt.Sprintf("%.3f", p.Exit.Mach), pr.speed(p.Exit.Velocity),
			pr.temp(p.Exit.StaticTemperature), l(p.Exit.FullyExpandedDiameter), pair(p.CoreNominal, p.CoreConservative),
			zl(jet.VelocityZone), zw(jet.VelocityZone), zl(jet.HotZone), zw(jet.HotZone), capture, flagWords(p.Flags),
		})
	}
	return t
}

// pressure prints the ambient pressure.
func pressure(b *builder) string {
	return unitsPressure(b.req.Ambient.Pressure, b.pr)
}

// flagWords lists the kinds of the regime flags once each: "shock-containing,
// outside fitted range".
func flagWords(fl []jet.Flag) string {
	var out []string
	seen := map[jet.FlagKind]bool{}
	for _, f := range fl {
		if !seen[f.Kind] {
			seen[f.Kind] = true
			out = append(out, f.Kind.String())
		}
	}
	if len(out) == 0 {
		return "none"
	}
	return strings.Join(out, ", ")
}

// absorptionTables returns the absorption table, split into parts of at
// most eight arrays.
func (b *builder) absorptionTables() []tableSpec {
	p := b.plan
	if len(p.Absorption) == 0 {
		return nil
	}
	names := make([]string, len(p.Arrays))
	for i, a := range p.Arrays {
		names[i] = a.Name
	}
	if len(names) == 0 {
		names = []string{""}
	}
	var out []tableSpec
	for lo := 0; lo < len(names); lo += 8 {
		hi := min(lo+8, len(names))
		t := tableSpec{
			name: "absorption",
			title: fmt.Sprintf("ATMOSPHERIC ABSORPTION for data reduction, %s to %s — pure-tone coefficient at the band centre and the loss over each array's path",
				b.bandText(b.req.Band.Low), b.bandText(b.req.Band.High)),
			heads: []string{"Band", "dB/m"},
		}
		for _, n := range names[lo:hi] {
			if n != "" {
				t.heads = append(t.heads, "Loss\u00a0"+n+" (dB)")
			}
		}
		t.right = make([]bool, len(t.heads))
		t.flex = make([]bool, len(t.heads))
		for i := 1; i < len(t.heads); i++ {
			t.right[i] = true
		}
		for _, row := range p.Absorption {
			r := []string{row.Band.Nominal, fmt.Sprintf("%.4f", row.PerM)}
			for j := lo; j < hi && names[0] != ""; j++ {
				if j < len(row.ArrayDB) {
					r = append(r, fmt.Sprintf("%.2f", row.ArrayDB[j]))
				} else {
					r = append(r, "-")
				}
			}
			t.rows = append(t.rows, r)
		}
		t.maxW = 30 + 22*float64(len(t.heads))
		out = append(out, t)
	}
	return out
}

// arraysTable returns the summary of the arrays: kind, size, far-field
// range and what blocks them.
func (b *builder) arraysTable() tableSpec {
	pr := b.pr
	t := tableSpec{
		name:  "arrays",
		title: "ARRAYS — radius (arcs), offset (lines) or ring radius; the far-field interval is the range of arc radii meeting the far-field criteria in this room",
		heads: []string{"Array", "Kind", "Stations", "Radius / offset", "Largest radius", "Far-field radii", "Closest clear polar", "Blocked and notes"},
	}
	t.right = []bool{false, false, true, true, true, false, true, false}
	t.flex = []bool{false, false, false, false, false, true, false, true}
	for _, a := range b.plan.Arrays {
		r := pr.short(a.Radius)
		if a.Kind == planner.Points || a.Kind == planner.Probes {
			r = "-"
		}
		if a.Auto {
			r += " (auto)"
		}
		maxR := "-"
		if a.Kind == planner.Arc && a.MaxRadius > 0 && finite(a.MaxRadius) {
			maxR = pr.short(a.MaxRadius)
		}
		ff := "-"
		if a.Kind == planner.Arc {
			if a.FarField[0] <= a.FarField[1] && finite(a.FarField[0], a.FarField[1]) {
				ff = pr.short(a.FarField[0]) + " to " + pr.short(a.FarField[1])
			} else {
				ff = "none"
			}
			if a.FarFieldNote != "" {
				ff += " (" + a.FarFieldNote + ")"
			}
		}
		mcp := "-"
		if finite(a.MinClearPolar) {
			mcp = degSign(a.MinClearPolar)
		}
		notes := append(append([]string(nil), a.Blocked...), a.Notes...)
		t.rows = append(t.rows, []string{a.Name, a.Kind.String(), strconv.Itoa(a.Stations), r, maxR, ff, mcp, strings.Join(notes, "; ")})
	}
	return t
}

// bandText prints a band limit, Hz.
func (b *builder) bandText(hz float64) string {
	if !finite(hz) || hz <= 0 {
		return "?"
	}
	return unitsFrequency(hz)
}
