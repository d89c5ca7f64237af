package planner

import (
	"fmt"
	"math"
	"strings"

	"arcwright/internal/acoustics"
	"arcwright/internal/geometry"
	"arcwright/internal/jet"
)

// polarScanStep is the step, rad, of the scan for the polar angle closest
// to the jet axis that clears the zones (0.25°).
const polarScanStep = 0.25 * math.Pi / 180

// summarise fills the array's blocked list, its clearest polar angle and
// its far-field interval.
func (ck *checker) summarise(res *ArrayResult, plan *Plan) {
	conv := ck.req.Convention
	var mine []*Station
	for i := range plan.Stations {
		if plan.Stations[i].Array == res.Name {
			mine = append(mine, &plan.Stations[i])
		}
	}
	// group runs of blocked stations with the same first reason
	for i := 0; i < len(mine); {
		s := mine[i]
		if s.Status != Blocked {
			i++
			continue
		}
		j := i
		for j+1 < len(mine) && mine[j+1].Status == Blocked && firstBlock(mine[j+1]) == firstBlock(s) {
			j++
		}
		ids := s.ID
		if j > i {
			ids += " to " + mine[j].ID
		}
		if !math.IsNaN(s.Nominal) {
			a, b := s.Nominal*180/math.Pi, mine[j].Nominal*180/math.Pi
			if j > i {
				ids += fmt.Sprintf(" (%s %.4g–%.4g°)", conv.Symbol(), a, b)
			} else {
				ids += fmt.Sprintf(" (%s %.4g°)", conv.Symbol(), a)
			}
		}
		res.Blocked = append(res.Blocked, ids+": "+s.Reasons[0])
		i = j + 1
	}
	if res.Kind != Arc {
		res.FarFieldNote = "the far-field interval is given for arcs"
		return
	}

	// the polar angle closest to the downstream axis that clears every zone
	a := res.Spec
	var stand *Stand
	if a.Stand != "" {
		s, _ := ck.req.Stand(a.Stand)
		stand = &s
	}
	pl := placer{req: ck.req, stand: stand}
	boom := 0.0
	if stand != nil {
		boom = stand.BoomLength
	}
	for tj := 0.0; tj <= math.Pi+1e-12; tj += polarScanStep {
		st := Station{Mic: pl.arcPoint(&a, tj, a.Radius), Stand: stand}
		st.Base = standBase(st.Mic, res.Centre, boom, ck.req.Exit, &a)
		fixed, bm := ck.hardware(&st)
		clear := true
		for k := range ck.points {
			p := &ck.points[k]
			if c, _ := zoneClearance(p.Velocity(), fixed, bm, ck.lim.Margin); c < ck.lim.Margin {
				clear = false
				break
			}
			if c, _ := zoneClearance(p.Hot(), fixed, bm, ck.lim.Margin); c < ck.lim.Margin {
				clear = false
				break
			}
		}
		if clear {
			res.MinClearPolar = conv.FromDownstream(tj)
			break
		}
	}

	// far-field interval: the largest lower bound against the room
	type bound struct {
		r    float64
		what string
	}
	var bs []bound
	dj, need := 0.0, 0.0
	var needBand acoustics.Band
	for k := range ck.points {
		e := ck.points[k].Exit
		dj = math.Max(dj, e.FullyExpandedDiameter)
		for _, b := range ck.bands {
			_, l := acoustics.SourceExtent(b.Centre, e.FullyExpandedDiameter, e.Velocity)
			if n := acoustics.FresnelRadius(l, b.Centre, ck.c); n > need {
				need, needBand = n, b
			}
		}
	}
	bs = append(bs,
		bound{ck.lim.FarFieldRatio * dj, fmt.Sprintf("R/Dj ≥ %.0f needs %s", ck.lim.FarFieldRatio, ck.m(ck.lim.FarFieldRatio*dj))},
		bound{minWavelengths * ck.lambdaLow, fmt.Sprintf("2 wavelengths at %.0f Hz need %s", ck.req.Band.Low, ck.m(minWavelengths*ck.lambdaLow))},
		bound{need, fmt.Sprintf("the Fresnel condition at %s needs %s", needBand.Nominal, ck.m(need))},
	)
	lo, why := 0.0, ""
	var parts []string
	for _, b := range bs {
		parts = append(parts, b.what)
		if b.r > lo {
			lo, why = b.r, b.what
		}
	}
	res.FarField = [2]float64{lo, res.MaxRadius}
	room := fmt.Sprintf("the %s allows %s", ck.room(), ck.m(res.MaxRadius))
	if math.IsInf(res.MaxRadius, 1) {
		room = "the site sets no upper limit"
	}
	if lo > res.MaxRadius {
		res.FarFieldNote = fmt.Sprintf("empty: %s, but %s (%s)", why, room, strings.Join(parts, "; "))
	} else {
		res.FarFieldNote = fmt.Sprintf("set by %s; %s (%s)", why, room, strings.Join(parts, "; "))
	}
}

// firstBlock names the first blocking check of a station.
func firstBlock(s *Station) string {
	for _, c := range s.Checks {
		if c.Verdict == Blocked {
			return c.Name + "/" + c.Point
		}
	}
	return ""
}

// absorptionTable lists the absorption of every 1/3-octave band over each
// array's path: the arc radius, or the mean distance of its stations.
func (ck *checker) absorptionTable(arrays []ArrayResult, stations []Station) []AbsorptionRow {
	paths := make([]float64, len(arrays))
	for i, a := range arrays {
		if a.Kind == Arc {
			paths[i] = a.Radius
			continue
		}
		n := 0
		for _, s := range stations {
			if s.Array == a.Name {
				paths[i] += s.Radius
				n++
			}
		}
		if n > 0 {
			paths[i] /= float64(n)
		}
	}
	rows := make([]AbsorptionRow, len(ck.bands))
	for i, b := range ck.bands {
		rows[i] = AbsorptionRow{Band: b, PerM: ck.atm.Absorption(b.Centre), ArrayDB: make([]float64, len(arrays))}
		for k := range arrays {
			rows[i].ArrayDB[k] = rows[i].PerM * paths[k]
		}
	}
	return rows
}

// warnings returns the plan-wide remarks.
func (ck *checker) warnings(atm acoustics.Atmosphere) []string {
	var w []string
	req := ck.req
	if req.CutOff > 0 && req.Band.Low < req.CutOff {
		w = append(w, fmt.Sprintf("the band starts at %.0f Hz, below the treatment's cut-off of %.0f Hz: the room is not anechoic at the low end", req.Band.Low, req.CutOff))
	}
	w = append(w, atm.Warnings()...)
	for _, p := range ck.points {
		for _, f := range p.Flags {
			switch f.Kind {
			case jet.FlagLaminar:
				w = append(w, p.Name+": "+f.String())
			case jet.FlagBuoyant:
				// in the layout's units (the model's own text is in metres)
				b := p.Plume.Buoyancy()
				dir := "up"
				if b.ReducedGravity < 0 {
					dir = "down"
				}
				zone := math.Max(p.Velocity().Length, p.Hot().Length)
				w = append(w, fmt.Sprintf("%s: buoyant: the %s zone reaches beyond %s, where buoyancy starts to bend the jet %s (x_b = 0.53, Chen & Rodi 1980; momentum length %s); the bent zones are checked too",
					p.Name, ck.m(zone), ck.m(b.Onset), dir, ck.m(b.MomentumLength)))
			}
		}
		if p.Capture != OK {
			w = append(w, fmt.Sprintf("%s: collector capture %s: %s", p.Name, p.Capture, p.CaptureReason))
		}
		w = append(w, ck.impingement(&p)...)
	}
	return w
}

// impingement says where a point's conservative zones reach the walls, the
// floor, the ceiling or an obstacle upstream of the collector
// (Plan.Impingements, from zoneReaches): there the exhaust turns into a wall
// jet that the free-jet model does not describe. An outdoor site limit is
// not a wall: there the zone runs on beyond it, off the site.
func (ck *checker) impingement(p *PointResult) []string {
	var out []string
	for _, im := range ck.imps {
		if im.Point != p.Name {
			continue
		}
		zone := "velocity zone"
		if im.Zone == jet.HotZone {
			zone = "hot zone"
		}
		if im.Surface == SurfaceObstacle {
			out = append(out, fmt.Sprintf("%s: the %s strikes the obstacle %s about %s downstream of the exit: the exhaust spreads along its faces there as a wall jet, which the free-jet model does not describe; keep stations and cables clear of it", p.Name, zone, im.Obstacle, ck.m(im.X)))
			continue
		}
		if im.Surface == SurfaceBoundary && ck.req.Cell.Kind == geometry.OutdoorPad {
			// an outdoor site limit is not a wall (issue 8): the jet runs on
			out = append(out, fmt.Sprintf("%s: the %s reaches the site limit about %s downstream of the exit: it runs on beyond the limit, off the site; keep people and equipment out beyond the limit downstream during runs, and warn the neighbours or close the road there", p.Name, zone, ck.m(im.X)))
			continue
		}
		what := map[string]string{SurfaceBoundary: ck.boundaryName(), SurfaceFloor: ck.floorName(), SurfaceCeiling: "ceiling"}[im.Surface]
		out = append(out, fmt.Sprintf("%s: the %s reaches the %s about %s downstream of the exit: the exhaust spreads along it there as a wall jet, which the free-jet model does not describe; keep stations and cables clear of that surface", p.Name, zone, what, ck.m(im.X)))
	}
	return out
}

// floorName names the cell's floor: the ground of an outdoor pad.
func (ck *checker) floorName() string {
	if ck.req.Cell.Kind == geometry.OutdoorPad {
		return "ground"
	}
	return "floor"
}

// boundaryName names the cell's boundary.
func (ck *checker) boundaryName() string {
	if ck.req.Cell.Kind == geometry.OutdoorPad {
		return "site limit"
	}
	return "walls"
}
