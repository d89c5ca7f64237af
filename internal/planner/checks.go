package planner

import (
	"fmt"
	"math"
	"slices"
	"strings"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/acoustics"
	"arcwright/internal/geometry"
	"arcwright/internal/jet"
	"arcwright/internal/units"
)

// Thresholds of the acoustic checks.
const (
	// minWavelengths is the smallest distance from the source, in
	// wavelengths at the band's low end, for the acoustic far field
	// (R ≥ 2λ; common practice, acoustics reference sheet §2.1).
	minWavelengths = 2
	// sourceOffsetLimit is the largest level error, dB, of treating the
	// source as sitting at the arc centre before a warning: about the
	// ±1 dB that free-field qualification allows (ISO 3745 Annex A, from
	// memory).
	sourceOffsetLimit = 1.0
	// entrainmentCoefficient is Ricou & Spalding's (1961) entrainment rate
	// of a round jet, ṁ/ṁ0 = 0.32·(ρa/ρj)^½·x/D (from memory). The radial
	// inflow it draws at distance d from the axis is
	// V = 0.32/8·Uj·D_eff/d (derived: line sink of strength dṁ/dx).
	entrainmentCoefficient = 0.32
	// flushHeight is the microphone height below which a microphone counts
	// as flush with the floor, m (common practice: ground-plane capsules sit
	// a few millimetres above their plate).
	flushHeight = 0.02
	// sightSamples is the number of points along the source region that
	// sight lines are drawn from.
	sightSamples = 5
	// boomStep is the spacing, m, of the samples along a boom.
	boomStep = 0.05
)

// higherIsWorse lists the checks whose larger values are worse.
var higherIsWorse = map[string]bool{CheckSourceErr: true, CheckAbsorption: true, CheckInflow: true, CheckBuoyancy: true, CheckLevel: true}

// worse reports whether a is worse than b (same check).
func worse(a, b Check) bool {
	if a.Verdict != b.Verdict {
		return a.Verdict > b.Verdict
	}
	av, bv := a.Value, b.Value
	if a.Name == CheckSourceErr {
		av, bv = math.Abs(av), math.Abs(bv)
	}
	switch {
	case math.IsNaN(bv):
		return !math.IsNaN(av)
	case math.IsNaN(av):
		return false
	case higherIsWorse[a.Name]:
		return av > bv
	}
	return av < bv
}

// tally keeps the worst result of each check over the operating points.
type tally struct {
	c   [len(checkNames)]Check
	has [len(checkNames)]bool
}

// checkNames lists the checks in the order they are reported.
var checkNames = [...]string{
	CheckVelocity, CheckHot, CheckWall, CheckObstacle, CheckKeepOut, CheckHeight, CheckSpacing,
	CheckSight, CheckFarField, CheckWavelength, CheckFresnel, CheckSourceErr, CheckGround,
	CheckAbsorption, CheckInflow, CheckBuoyancy, CheckLevel, CheckAsBuilt,
}

var checkIndex = func() map[string]int {
	m := map[string]int{}
	for i, n := range checkNames {
		m[n] = i
	}
	return m
}()

func (t *tally) add(c Check) { t.offer(c, func(c Check) string { return c.Reason }) }

// offer keeps c if it is worse than what t holds, writing its reason only
// then: most per-point results are not kept, and formatting them all would
// dominate the planner's time.
func (t *tally) offer(c Check, reason func(c Check) string) {
	i := checkIndex[c.Name]
	if !t.has[i] || worse(c, t.c[i]) {
		c.Reason = reason(c)
		t.c[i], t.has[i] = c, true
	}
}

// get returns the kept result of a check.
func (t *tally) get(name string) (Check, bool) {
	i := checkIndex[name]
	return t.c[i], t.has[i]
}

// probe is a sample of a station's hardware in the jet frame: the distance
// from a zone at (x, r), less pen, bounds the hardware's clearance.
type probe struct {
	x, r, pen float64
	part      string
}

// checker holds what the checks of every station share.
type checker struct {
	req       *Request
	lim       Limits
	points    []PointResult
	order     []int // points, governing first
	atm       acoustics.Atmosphere
	c         float64 // speed of sound, m/s
	lambdaLow float64 // wavelength at the band's low end, m
	quarter   float64 // λ/4 at the band's low end where walls are treated, else 0
	alphaHigh float64 // absorption at the band's top, dB/m
	bands     []acoustics.Band
	obstacles *geometry.Index
	stands    *geometry.Index
	feet      []foot     // stand footprints, by station index
	spread    *standTree // the footprints, for the spacing check
	sources   []r3.Vec
	srcPoint  string // the point whose source region is longest
	maxFoot   float64
	splashes  []splash      // where zones strike obstacles
	attached  []Attached    // zones carried on by the floor, ceiling and walls
	fresnel   [][]float64   // L²/λ per point and band, m
	noise     *noiseModel   // level predictions
	imps      []Impingement // where zones reach surfaces, for the warnings
}

// m prints a length in the layout's units, to about three figures.
func (ck *checker) m(x float64) string { return units.FormatLengthApprox(x, ck.req.System()) }

// v prints a velocity in the layout's units.
func (ck *checker) v(x float64) string { return units.FormatVelocity(x, ck.req.System()) }

// t prints a temperature in the layout's units.
func (ck *checker) t(x float64) string { return units.FormatTemperature(x, ck.req.System()) }

// room names the cell: a room, or the site of an outdoor pad.
func (ck *checker) room() string {
	if ck.req.Cell.Kind == geometry.OutdoorPad {
		return "site"
	}
	return "room"
}

// foot is a stand's plan footprint.
type foot struct {
	at orb.Point
	r  float64
}

// hardware returns the jet-frame probes of station st.
func (ck *checker) hardware(st *Station) (fixed []probe, boom []probe) {
	f := ck.req.Exit
	mic := f.ToJet(st.Mic)
	fixed = append(fixed, probe{mic.X, mic.R, 0, "microphone"})
	s := st.Stand
	if s == nil {
		return fixed, nil
	}
	zAxis := f.Exit.Z
	top := st.Mic.Z
	at := func(z float64) geometry.JetPoint { return f.ToJet(r3.Vec{X: st.Base[0], Y: st.Base[1], Z: z}) }
	// the pole's point nearest the axis is at axis height (clamped to the
	// pole): the distance to a body of revolution never grows toward it
	pole := at(math.Max(0, math.Min(zAxis, top)))
	fixed = append(fixed, probe{pole.X, pole.R, s.PoleDiameter / 2, "stand pole"})
	ptop := at(top)
	fixed = append(fixed, probe{ptop.X, ptop.R, s.PoleDiameter / 2, "stand pole"})
	base := at(math.Max(0, math.Min(zAxis, s.BaseHeight)))
	fixed = append(fixed, probe{base.X, base.R, s.BaseRadius, "stand base"})
	// the arm from the pole top to the microphone as placed (or as built),
	// sampled end to end: every point of it is within h/2 of a sample
	b := r3.Vec{X: st.Base[0], Y: st.Base[1], Z: top}
	if arm := math.Hypot(st.Mic.X-b.X, st.Mic.Y-b.Y); arm > 1e-3 {
		n := int(math.Ceil(arm / boomStep))
		n = max(2, min(n, 64))
		h := arm / float64(n)
		for i := 0; i <= n; i++ {
			p := f.ToJet(r3.Add(b, r3.Scale(float64(i)/float64(n), r3.Sub(st.Mic, b))))
			boom = append(boom, probe{p.X, p.R, h/2 + s.PoleDiameter/2, "boom"})
		}
	}
	return fixed, boom
}

// zoneClearance returns the clearance of the probes from e and the part
// that sets it; best is the smallest clearance found so far for other
// points: probes that cannot beat it are skipped.
func zoneClearance(e *jet.Envelope, fixed, boom []probe, best float64) (float64, string) {
	if e.Length == 0 {
		return math.Inf(1), ""
	}
	min, part := math.Inf(1), ""
	try := func(p probe) {
		// the distance to the zone's bounding box bounds the clearance
		dx := math.Max(0, math.Max(-p.x, p.x-e.Length))
		dr := math.Max(0, p.r-e.MaxRadius)
		if lb := math.Hypot(dx, dr) - e.Tolerance - p.pen; lb >= math.Min(min, best) {
			return
		}
		c := e.Clearance(p.x, p.r) - p.pen
		if c < min || math.IsNaN(c) {
			min, part = c, p.part
		}
	}
	for _, p := range fixed {
		try(p)
		if math.IsNaN(min) {
			return min, p.part // not evaluable: never read as clear
		}
	}
	for _, p := range boom {
		try(p)
		if math.IsNaN(min) {
			return min, p.part
		}
	}
	return min, part
}

// zoneHit is the clearance of a station's (or a crew position's) probes
// from one conservative zone of one operating point.
type zoneHit struct {
	c    float64 // clearance less the part's radius, m; NaN: not evaluable
	part string  // the part that sets it
	bent bool    // set by the zone about the bent path of a buoyant point
	wall *Attached
}

// zoneHit returns the clearance of the probes from zone z (envelope env) of
// point p: about the straight axis, about the bent path of a buoyant point
// and the zones the floor, ceiling and walls carry on, whichever is
// nearest. bent holds the same hardware as bent-zone probes (it may be nil
// when p is not buoyant and nothing is attached); best is the smallest
// clearance found so far for other points: probes that cannot beat it are
// skipped.
func (ck *checker) zoneHit(p *PointResult, z jet.Zone, env *jet.Envelope, fixed, boom []probe, bent []bentProbe, best float64) zoneHit {
	c, part := zoneClearance(env, fixed, boom, best)
	h := zoneHit{c: c, part: part}
	if bp := p.Plume.Bent(); bp != nil {
		if cb, pb := bentClearance(bp, z, bent, math.Min(c, best)); cb < h.c || math.IsNaN(cb) {
			h.c, h.part, h.bent = cb, pb, true
		}
	}
	if len(ck.attached) > 0 {
		if ca, pa, a := ck.attachedClearance(p.Name, z, bent); ca < h.c || math.IsNaN(ca) {
			h = zoneHit{c: ca, part: pa, wall: a}
		}
	}
	return h
}

// zoneWords names zone z with its limit and, from h, how it is bent or
// carried: "velocity zone (mean flow above 5 m/s), bent by buoyancy,".
func (ck *checker) zoneWords(z jet.Zone, h zoneHit) string {
	w := fmt.Sprintf("velocity zone (mean flow above %s)", ck.v(ck.lim.Velocity))
	if z == jet.HotZone {
		w = fmt.Sprintf("hot zone (above %s)", ck.t(ck.lim.Temperature))
	}
	switch {
	case h.bent:
		w += ", bent by buoyancy,"
	case h.wall != nil:
		how := "carried along the " + h.wall.Surface + " as a wall jet"
		if h.wall.Radial {
			how = "spread over the wall it strikes"
		}
		w += ", " + how + ","
	}
	return w
}

// evaluate runs every check on station i and sets its verdict.
func (ck *checker) evaluate(st *Station, i int, arr *Array, centreX float64) {
	t := &tally{}
	lim := ck.lim
	cell := &ck.req.Cell
	f := ck.req.Exit
	mic := f.ToJet(st.Mic)
	fixed, boom := ck.hardware(st)

	// 1. zones, for every operating point, governing point first; a
	// buoyant point's zones both about the axis and about its bent path
	bestV, bestH := math.Inf(1), math.Inf(1)
	var bentProbes []bentProbe
	for _, k := range ck.order {
		p := &ck.points[k]
		if (p.Plume.Bent() != nil || len(ck.attached) > 0) && bentProbes == nil {
			bentProbes = ck.bentProbes(st)
		}
		for _, z := range []struct {
			name string
			zone jet.Zone
			env  *jet.Envelope
			best *float64
		}{
			{CheckVelocity, jet.VelocityZone, p.Velocity(), &bestV},
			{CheckHot, jet.HotZone, p.Hot(), &bestH},
		} {
			h := ck.zoneHit(p, z.zone, z.env, fixed, boom, bentProbes, *z.best)
			c, part := h.c, h.part
			if _, seen := t.get(z.name); seen && c >= *z.best {
				continue
			}
			*z.best = math.Min(*z.best, c)
			ch := Check{Name: z.name, Value: c, Unit: "m", Verdict: OK, Point: p.Name}
			if c < lim.Margin {
				ch.Verdict = Blocked
			}
			t.offer(ch, func(ch Check) (reason string) {
				what := ck.zoneWords(z.zone, h)
				switch {
				case math.IsInf(c, 1):
					reason = "no " + what + " at this point"
				case c < 0:
					reason = fmt.Sprintf("%s inside the %s of %s, %s deep", part, what, p.Name, ck.m(-c))
				case c < lim.Margin:
					reason = fmt.Sprintf("%s %s from the %s of %s; the margin is %s", part, ck.m(c), what, p.Name, ck.m(lim.Margin))
				default:
					reason = fmt.Sprintf("%s clear of the %s of %s", ck.m(c), what, p.Name)
				}
				return
			})
		}
	}

	// 2. room: boundary, obstacles, keep-outs, floor and ceiling
	var pc geometry.PoleClearance
	if st.Stand != nil {
		pc = cell.PoleClearance(st.Base, math.Max(st.Mic.Z, 0), st.Stand.PoleDiameter/2, st.Stand.BaseRadius)
	} else {
		pc = cell.PoleClearance(st.Base, 0, flushRadius, flushRadius)
	}
	micPlan := orb.Point{st.Mic.X, st.Mic.Y}
	wall := math.Min(pc.Wall, cell.WallDistance(micPlan))
	// the arm from the pole top to the microphone, sampled: every point of
	// it is within h/2 of a sample (and the tube has the pole's radius)
	var arm []r3.Vec
	armPen := 0.0
	if st.Stand != nil {
		top := r3.Vec{X: st.Base[0], Y: st.Base[1], Z: st.Mic.Z}
		if l := math.Hypot(st.Mic.X-top.X, st.Mic.Y-top.Y); l > 1e-3 {
			n := max(2, min(int(math.Ceil(l/boomStep)), 64))
			armPen = l/float64(n)/2 + st.Stand.PoleDiameter/2
			for i := 0; i <= n; i++ {
				arm = append(arm, r3.Add(top, r3.Scale(float64(i)/float64(n), r3.Sub(st.Mic, top))))
			}
		}
	}
	for _, q := range arm {
		wall = math.Min(wall, cell.WallDistance(orb.Point{q.X, q.Y})-armPen)
	}
	wc := Check{Name: CheckWall, Value: wall, Unit: "m", Verdict: OK}
	switch {
	case math.IsInf(wall, 1):
		wc.Reason = "open site: no boundary"
	case wall < 0:
		wc.Verdict = Blocked
		wc.Reason = fmt.Sprintf("outside the %s or crossing its boundary by %s", ck.room(), ck.m(-wall))
	case wall < lim.WallClearance:
		wc.Verdict = Blocked
		wc.Reason = fmt.Sprintf("%s from the boundary; the layout asks %s", ck.m(wall), ck.m(lim.WallClearance))
	case wall < ck.quarter:
		wc.Verdict = Warn
		wc.Reason = fmt.Sprintf("%s from the wedge tips, less than a quarter wavelength (%s) at %.0f Hz: reflections from the treatment (common practice)", ck.m(wall), ck.m(ck.quarter), ck.req.Band.Low)
	default:
		wc.Reason = fmt.Sprintf("%s from the boundary", ck.m(wall))
	}
	t.add(wc)

	obst, oname := pc.Obstacle, pc.ObstacleName
	for _, o := range cell.Obstacles {
		sd := o.Solid()
		if d := sd.Distance(st.Mic); d < obst {
			obst, oname = d, o.Name
		}
		for _, q := range arm {
			if d := sd.Distance(q) - armPen; d < obst {
				obst, oname = d, o.Name
			}
		}
	}
	oc := Check{Name: CheckObstacle, Value: obst, Unit: "m", Verdict: OK}
	switch {
	case math.IsInf(obst, 1):
		oc.Reason = "no obstacle near"
	case obst < 0:
		oc.Verdict = Blocked
		oc.Reason = fmt.Sprintf("overlaps %s by %s", oname, ck.m(-obst))
	case obst < lim.StandSpacing:
		oc.Verdict = Warn
		oc.Reason = fmt.Sprintf("%s from %s", ck.m(obst), oname)
	default:
		oc.Reason = fmt.Sprintf("%s from %s", ck.m(obst), oname)
	}
	if oc.Verdict != Blocked {
		ck.splashCheck(&oc, oname, st, arm, armPen)
	}
	t.add(oc)

	ko, kname := pc.KeepOut, pc.KeepOutName
	for _, k := range cell.KeepOuts {
		if d := k.Footprint.Distance(micPlan); d < ko {
			ko, kname = d, k.Name
		}
	}
	kc := Check{Name: CheckKeepOut, Value: ko, Unit: "m", Verdict: OK}
	switch {
	case math.IsInf(ko, 1):
		kc.Reason = "no keep-out zone"
	case ko < 0:
		kc.Verdict = Blocked
		kc.Reason = fmt.Sprintf("in the keep-out zone %s", kname)
	default:
		kc.Reason = fmt.Sprintf("%s from the keep-out zone %s", ck.m(ko), kname)
	}
	t.add(kc)

	h := st.Mic.Z
	hc := Check{Name: CheckHeight, Value: math.Min(h, cell.Ceiling-h), Unit: "m", Verdict: OK}
	switch {
	case h < -1e-9:
		hc.Verdict = Blocked
		hc.Reason = fmt.Sprintf("%s below the %s", ck.m(-h), ck.floorName())
	case h > cell.Ceiling:
		hc.Verdict = Blocked
		hc.Reason = fmt.Sprintf("%s above the ceiling", ck.m(h-cell.Ceiling))
	case cell.Kind == geometry.Anechoic && cell.Ceiling-h < ck.quarter:
		hc.Verdict = Warn
		hc.Reason = fmt.Sprintf("%s below the ceiling treatment, less than a quarter wavelength at %.0f Hz", ck.m(cell.Ceiling-h), ck.req.Band.Low)
	case math.IsInf(cell.Ceiling, 1):
		hc.Value = h
		hc.Reason = fmt.Sprintf("%s above the %s, open sky", ck.m(h), ck.floorName())
	default:
		hc.Reason = fmt.Sprintf("%s above the %s, %s below the ceiling", ck.m(h), ck.floorName(), ck.m(cell.Ceiling-h))
	}
	t.add(hc)

	// 3. spacing from other stands
	t.add(ck.spacing(st, i))
	if c, ok := ck.asBuilt(st); ok {
		t.add(c)
	}

	isMic := st.Kind != Probes
	// 4. sight line from the source region
	if isMic {
		t.add(ck.sight(st, i))
	}

	// 5–10: acoustics, per point
	if isMic {
		ck.acoustic(st, mic, centreX, t)
		ck.levelCheck(st, arr, t)
	}
	ck.finish(st, t)
}

// sightNames is the number of blockers a sight-line reason names; more are
// summarised as "and others".
const sightNames = 3

// sight checks the lines from points along the source region to the
// microphone against the boundary, obstacles and other stands. It looks for
// only the first few stands on each line, so a crowd of stands costs no
// more than a few.
func (ck *checker) sight(st *Station, i int) Check {
	blocked := 0
	by := map[string]bool{}
	var names []string
	more := false
	name := func(n string) {
		if by[n] {
			return
		}
		if len(names) == sightNames {
			more = true
			return
		}
		by[n] = true
		names = append(names, n)
	}
	var hits []int
	cell := &ck.req.Cell
	for _, s := range ck.sources {
		hit := false
		if !cell.SegmentInside(orb.Point{s.X, s.Y}, orb.Point{st.Mic.X, st.Mic.Y}) {
			hit = true
			name("the " + ck.boundaryName())
		}
		hits = ck.obstacles.AppendSegmentHits(hits[:0], s, st.Mic)
		for _, j := range hits {
			hit = true
			name(ck.obstacles.Solid(j).Name)
		}
		hits = ck.stands.AppendFirstSegmentHits(hits[:0], s, st.Mic, sightNames+1, i)
		slices.Sort(hits)
		for _, j := range hits {
			hit = true
			name("the stand of " + ck.stands.Solid(j).Name)
		}
		if hit {
			blocked++
		}
	}
	list := strings.Join(names, ", ")
	if more {
		list += " and others"
	}
	frac := 1 - float64(blocked)/float64(len(ck.sources))
	c := Check{Name: CheckSight, Value: frac, Unit: "", Verdict: OK, Point: ck.srcPoint}
	switch {
	case blocked == 0:
		c.Reason = "clear view of the source region"
	case frac == 0:
		c.Verdict = Blocked
		c.Reason = "no view of the source region: hidden by " + list
	default:
		c.Verdict = Warn
		c.Reason = fmt.Sprintf("%d of %d sight lines to the source region pass through %s", blocked, len(ck.sources), list)
	}
	return c
}

// acoustic runs the far-field, floor, absorption, inflow and buoyancy
// checks for every operating point.
func (ck *checker) acoustic(st *Station, mic geometry.JetPoint, centreX float64, t *tally) {
	req := ck.req
	lim := ck.lim
	r := st.Radius
	band := req.Band

	// a near-field line is meant to be inside the acoustic near field: the
	// far-field criteria do not apply to it
	farField := st.Kind != NearField
	wl := r / ck.lambdaLow
	if farField {
		wcheck := Check{Name: CheckWavelength, Value: wl, Unit: "λ", Verdict: OK,
			Reason: fmt.Sprintf("%.1f wavelengths from the source at %.0f Hz", wl, band.Low)}
		if wl < minWavelengths {
			wcheck.Verdict = Warn
			wcheck.Reason = fmt.Sprintf("only %.2f wavelengths from the source at %.0f Hz; the acoustic far field needs about 2 (common practice)", wl, band.Low)
		}
		t.add(wcheck)
	}

	ab := ck.alphaHigh * r
	ac := Check{Name: CheckAbsorption, Value: ab, Unit: "dB", Verdict: OK,
		Reason: fmt.Sprintf("%.2f dB of air absorption in the %s band over %s (ISO 9613-1)", ab, ck.bands[len(ck.bands)-1].Nominal, ck.m(r))}
	if ab > lim.Absorption {
		ac.Verdict = Warn
		ac.Reason += fmt.Sprintf(", above the %.3g dB the layout allows: correct the spectra to lossless", lim.Absorption)
	}
	t.add(ac)

	hard := req.Cell.Floor == geometry.Hard
	flush := st.Mic.Z < flushHeight
	for _, k := range ck.order {
		p := &ck.points[k]
		e := p.Exit
		dj := e.FullyExpandedDiameter

		if farField {
			ratio := r / dj
			fc := Check{Name: CheckFarField, Value: ratio, Unit: "Dj", Verdict: OK, Point: p.Name}
			if ratio < lim.FarFieldRatio {
				fc.Verdict = Warn
			}
			t.offer(fc, func(c Check) (reason string) {
				reason = fmt.Sprintf("R/Dj = %.0f for %s", ratio, p.Name)
				if c.Verdict == Warn {
					reason = fmt.Sprintf("R/Dj = %.1f for %s, below the %.0f the layout asks (common practice)", ratio, p.Name, lim.FarFieldRatio)
				}
				return
			})

			needs := ck.fresnel[k]
			need := 0.0
			first, last := -1, -1
			for b, n := range needs {
				need = math.Max(need, n)
				if n > r {
					if first < 0 {
						first = b
					}
					last = b
				}
			}
			fr := Check{Name: CheckFresnel, Value: r / need, Unit: "", Verdict: OK, Point: p.Name}
			if first >= 0 {
				fr.Verdict = Warn
			}
			t.offer(fr, func(c Check) (reason string) {
				if first < 0 {
					reason = fmt.Sprintf("R ≥ L²/λ across the band for %s (R is %.2f times the largest L²/λ)", p.Name, r/need)
					return
				}
				span := ck.bands[first].Nominal
				if last > first {
					span = "bands " + span + " to " + ck.bands[last].Nominal
				}
				reason = fmt.Sprintf("the Fresnel condition R ≥ L²/λ fails at %s for %s: the source region (up to %s long there) is not compact seen from %s; it needs %s", span, p.Name, ck.m(sourceLength(ck.bands[first:last+1], dj, e.Velocity)), ck.m(r), ck.m(need))
				return
			})

			xs := p.CoreNominal - centreX
			q := geometry.JetPoint{X: mic.X - centreX, R: mic.R}
			_, thTrue, lerr := acoustics.SourceOffset(q.Distance(), q.Polar(), xs)
			sc := Check{Name: CheckSourceErr, Value: lerr, Unit: "dB", Verdict: OK, Point: p.Name}
			if math.Abs(lerr) > sourceOffsetLimit {
				sc.Verdict = Warn
			}
			t.offer(sc, func(c Check) (reason string) {
				dth := (thTrue - q.Polar()) * 180 / math.Pi
				reason = fmt.Sprintf("%+.2f dB, %+.1f° from a source at the end of the core of %s", lerr, dth, p.Name)
				if c.Verdict == Warn {
					reason = fmt.Sprintf("treating the source as at the array centre errs by %+.2f dB and %+.1f° for %s (source near the end of the core, %s downstream)", lerr, dth, p.Name, ck.m(p.CoreNominal))
				}
				return
			})
		}

		gc := Check{Name: CheckGround, Value: math.NaN(), Unit: "Hz", Verdict: OK, Point: p.Name}
		switch {
		case !hard:
			t.offer(gc, func(c Check) (reason string) {
				reason = fmt.Sprintf("%s %s: no coherent %s reflection assumed", req.Cell.Floor, ck.floorName(), ck.floorName())
				if req.Cell.Floor == geometry.Grass {
					reason = "grass " + ck.floorName() + ": no null predicted (finite-impedance ground); the levels add the " + ck.floorName() + " image, at least its energy (up to +3 dB)"
				}
				return
			})
		case flush:
			t.offer(gc, func(c Check) (reason string) {
				reason = "flush on the " + ck.floorName() + ": no null; the level is doubled (subtract 6 dB)"
				return
			})
		default:
			src := req.Exit.ToCell(geometry.JetPoint{X: p.CoreNominal})
			d := math.Hypot(st.Mic.X-src.X, st.Mic.Y-src.Y)
			hs := req.Exit.Exit.Z
			refl := acoustics.FloorReflection(hs, st.Mic.Z, d)
			gc.Value = refl.NullFrequency(0, ck.c)
			fnull, in := acoustics.FirstNullInBand(refl, ck.c, band.Low, band.High)
			if in {
				gc.Verdict = Warn
			}
			t.offer(gc, func(c Check) (reason string) {
				if !in {
					reason = fmt.Sprintf("first %s null at %.0f Hz, outside the band", ck.floorName(), c.Value)
					return
				}
				hmax := ck.c * d / (4 * hs * band.High)
				reason = fmt.Sprintf("%s-reflection null at %.0f Hz inside the band (source %s, microphone %s high, %s apart): use a ground-plane microphone, or lower it below about %s to move the first null above %s", ck.floorName(), fnull, ck.m(hs), ck.m(st.Mic.Z), ck.m(d), ck.m(hmax), units.FormatFrequency(band.High))
				return
			})
		}

		dist := mic.R
		if mic.X < 0 {
			dist = mic.Distance()
		}
		v := entrainmentCoefficient / 8 * e.Velocity * e.EffectiveDiameter / dist
		ic := Check{Name: CheckInflow, Value: v, Unit: "m/s", Verdict: OK, Point: p.Name}
		if v > lim.Inflow {
			ic.Verdict = Warn
		}
		t.offer(ic, func(c Check) (reason string) {
			reason = fmt.Sprintf("%s of entrained inflow (Ricou & Spalding 1961) for %s", ck.v(v), p.Name)
			if c.Verdict == Warn {
				reason = fmt.Sprintf("%s of air drawn in by the jet of %s (Ricou & Spalding 1961), above %s: flow over the microphone adds self-noise; use a nose cone or windscreen, or move it out", ck.v(v), p.Name, ck.v(lim.Inflow))
			}
			return
		})

		bc := Check{Name: CheckBuoyancy, Value: 0, Unit: "", Verdict: OK, Point: p.Name}
		var onset float64
		dir := "above"
		if jet.Has(p.Flags, jet.FlagBuoyant) {
			b := p.Plume.Buoyancy()
			onset = b.Onset
			reach := math.Max(p.Velocity().Length, p.Hot().Length)
			dz := st.Mic.Z - req.Exit.Exit.Z
			lateral := math.Sqrt(math.Max(0, mic.R*mic.R-dz*dz))
			rz := math.Max(p.Velocity().Radius(mic.X), p.Hot().Radius(mic.X)) + lim.Margin
			if b.ReducedGravity < 0 {
				dir = "below"
			}
			if dz*b.ReducedGravity > 0 && mic.X >= b.Onset && mic.X <= reach && lateral <= rz {
				bc.Value, bc.Verdict = 1, Warn
			}
		}
		t.offer(bc, func(c Check) (reason string) {
			reason = "not in the reach of a buoyant plume"
			if c.Verdict == Warn {
				reason = fmt.Sprintf("%s the jet of %s where buoyancy bends it (beyond %s): the bent plume may reach this station", dir, p.Name, ck.m(onset))
			}
			return
		})
	}
}

// sourceLength returns the longest radiating region over bands, m.
func sourceLength(bands []acoustics.Band, dj, uj float64) float64 {
	l := 0.0
	for _, b := range bands {
		_, x := acoustics.SourceExtent(b.Centre, dj, uj)
		l = math.Max(l, x)
	}
	return l
}

// finish orders the checks, sets the station's verdict, governing point
// and reasons. A check whose value could not be computed blocks the
// station: it is never reported OK unevaluated.
func (ck *checker) finish(st *Station, t *tally) {
	st.Checks = st.Checks[:0]
	st.Status = OK
	worst := Check{Verdict: 0}
	for _, name := range checkNames {
		c, ok := t.get(name)
		if !ok {
			continue
		}
		if math.IsNaN(c.Value) && name != CheckGround && name != CheckAsBuilt {
			c.Verdict = Blocked
			c.Reason = "could not be evaluated: " + c.Reason
		}
		st.Checks = append(st.Checks, c)
		if c.Verdict > st.Status {
			st.Status = c.Verdict
		}
		if c.Point != "" && c.Verdict > worst.Verdict {
			worst = c
		}
	}
	st.Governing = worst.Point
	if worst.Verdict == OK || worst.Point == "" {
		if v, ok := t.get(CheckVelocity); ok {
			st.Governing = v.Point
		}
	}
	st.Reasons = st.Reasons[:0]
	for _, v := range []Verdict{Blocked, Warn} {
		for _, c := range st.Checks {
			if c.Verdict == v {
				st.Reasons = append(st.Reasons, c.Reason)
			}
		}
	}
}
