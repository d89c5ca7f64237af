package planner

import (
	"errors"
	"fmt"
	"math"
	"sort"
	"strings"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/acoustics"
	"arcwright/internal/geometry"
)

// ErrRequest is wrapped by every error about a request the planner cannot
// plan.
var ErrRequest = errors.New("planner: bad request")

// ErrAsBuilt is wrapped by the error about as-built positions that name
// no station of the plan.
var ErrAsBuilt = errors.New("as-built positions")

func plural(n int, one, many string) string {
	if n == 1 {
		return one
	}
	return many
}

// New places every station of req, checks each against every operating
// point and returns the plan. req is not modified.
//
// It runs in phases, each a function below: predict the operating points,
// prepare the checks (newChecker), place the arrays (placeArrays), name the
// stations and apply the as-built positions (makeStations), index the
// solids (indexSolids), find where zones strike obstacles (findSplashes),
// check the stations (checkStations) and summarise
// (summarisePlan).
func New(req *Request) (*Plan, error) {
	if err := validate(req); err != nil {
		return nil, err
	}
	lim := req.Limits.withDefaults()
	points, err := predict(req, lim)
	if err != nil {
		return nil, err
	}
	plan := &Plan{Request: req, Points: points}
	plan.Governing, plan.GoverningHot = governing(points)
	ck, err := newChecker(req, lim, points, plan.Governing)
	if err != nil {
		return nil, err
	}
	placed, err := ck.placeArrays()
	if err != nil {
		return nil, err
	}
	if err := ck.makeStations(plan, placed); err != nil {
		return nil, err
	}
	ck.indexSolids(plan.Stations)
	ck.splashes = ck.findSplashes()
	ck.attached = ck.attachedZones()
	plan.Attached = ck.attached
	ck.checkStations(plan, placed)
	ck.summarisePlan(plan, placed)
	return plan, nil
}

// newChecker prepares what every check needs: the atmosphere, the bands,
// the acoustic constants, the order of the points (governing first) and the
// source samples for sight lines.
func newChecker(req *Request, lim Limits, points []PointResult, gov int) (*checker, error) {
	atm := acoustics.Atmosphere{Temperature: req.Ambient.Temperature, RelativeHumidity: req.Ambient.Humidity, Pressure: req.Ambient.Pressure}
	if err := atm.Validate(); err != nil {
		return nil, fmt.Errorf("%w: ambient: %w", ErrRequest, err)
	}
	bands, err := acoustics.ThirdOctaveBands(req.Band.Low, req.Band.High)
	if err != nil {
		return nil, fmt.Errorf("%w: band: %w", ErrRequest, err)
	}
	if len(bands) == 0 {
		return nil, fmt.Errorf("%w: the band %g–%g Hz holds no 1/3-octave band centre", ErrRequest, req.Band.Low, req.Band.High)
	}
	ck := &checker{req: req, lim: lim, points: points, atm: atm, bands: bands}
	if ck.noise, err = newNoiseModel(req, points, atm); err != nil {
		return nil, err
	}
	ck.c = atm.SpeedOfSound()
	ck.lambdaLow = acoustics.Wavelength(req.Band.Low, ck.c)
	if req.Cell.Kind == geometry.Anechoic {
		ck.quarter = acoustics.QuarterWave(req.Band.Low, ck.c)
	}
	// at the exact centre of the top band, as in the absorption table
	ck.alphaHigh = atm.Absorption(bands[len(bands)-1].Centre)
	ck.fresnel = make([][]float64, len(points))
	for k := range points {
		e := points[k].Exit
		ck.fresnel[k] = make([]float64, len(bands))
		for b, band := range bands {
			_, l := acoustics.SourceExtent(band.Centre, e.FullyExpandedDiameter, e.Velocity)
			ck.fresnel[k][b] = acoustics.FresnelRadius(l, band.Centre, ck.c)
		}
	}
	ck.order = append(ck.order, gov)
	for i := range points {
		if i != gov {
			ck.order = append(ck.order, i)
		}
	}
	for i := range points {
		if points[i].SourceEnd >= points[indexOf(points, ck.srcPoint)].SourceEnd || ck.srcPoint == "" {
			ck.srcPoint = points[i].Name
		}
	}
	src := points[indexOf(points, ck.srcPoint)].SourceEnd
	for _, q := range sourceAxis(req.Exit, src, sightSamples) {
		ck.sources = append(ck.sources, req.Exit.ToCell(q))
	}
	return ck, nil
}

// placedArray is one array after placement: its result so far, its spots,
// its stand (nil for flush or free microphones) and its centre.
type placedArray struct {
	res    ArrayResult
	spots  []spot
	stand  *Stand
	centre r3.Vec
}

// placeArrays places every array of the request: sizes automatic radii,
// lays near-field lines along the widest zone and returns the spots.
func (ck *checker) placeArrays() ([]placedArray, error) {
	req := ck.req
	placed := make([]placedArray, len(req.Arrays))
	for ai := range req.Arrays {
		a := req.Arrays[ai]
		var stand *Stand
		if a.Stand != "" {
			s, ok := req.Stand(a.Stand)
			if !ok {
				return nil, fmt.Errorf("%w: array %s: unknown stand %q", ErrRequest, a.Name, a.Stand)
			}
			stand = &s
		}
		pl := placer{req: req, stand: stand}
		res := ArrayResult{Name: a.Name, Kind: a.Kind, MinClearPolar: math.NaN(), FarField: [2]float64{math.Inf(1), math.Inf(-1)}}
		var edge nearLine
		switch a.Kind {
		case Arc:
			res.MaxRadius = ck.roomRadius(pl, &a)
			if a.AutoRadius {
				if math.IsInf(res.MaxRadius, 1) {
					return nil, fmt.Errorf("%w: array %s: radius auto needs a room boundary or site limit to size against", ErrRequest, a.Name)
				}
				if res.MaxRadius <= 0 {
					return nil, fmt.Errorf("%w: array %s: no radius keeps every requested angle inside the %s with %s from the boundary", ErrRequest, a.Name, ck.room(), ck.m(ck.wallNeed()))
				}
				a.Radius = math.Floor(res.MaxRadius*1000) / 1000
				res.Auto = true
			}
			res.Radius = a.Radius
		case Ring:
			res.Radius = a.Radius
		case Line:
			res.Radius = a.Offset
		case NearField:
			edge = edgeLine(ck.points, a.XFrom, a.XTo)
			res.Radius, res.edge = a.Clearance, edge
			if a.Clearance < ck.lim.Margin {
				res.Notes = append(res.Notes, fmt.Sprintf("the clearance %s is less than the %s margin: its stations will be blocked", ck.m(a.Clearance), ck.m(ck.lim.Margin)))
			}
			res.Notes = append(res.Notes, fmt.Sprintf("follows the edge of the widest conservative velocity zone (%s at the lip, spreading at %.1f° from the axis) at %s", ck.m(edge.r0), math.Atan(edge.slope)*180/math.Pi, ck.m(a.Clearance)))
		}
		res.Spec = a
		res.Centre = pl.centre(&a)
		sp, notes := pl.spots(&a, a.Radius, edge)
		res.Notes = append(res.Notes, notes...)
		placed[ai] = placedArray{res: res, spots: sp, stand: stand, centre: res.Centre}
	}
	return placed, nil
}

// makeStations turns the placed spots into stations with IDs, channels,
// stands and bases, and applies the as-built positions.
func (ck *checker) makeStations(plan *Plan, placed []placedArray) error {
	channel := 0
	used := map[string]bool{}
	for ai := range placed {
		pa := &placed[ai]
		a := &pa.res.Spec
		if a.FirstChannel > 0 {
			channel = a.FirstChannel - 1
		}
		width := max(2, len(fmt.Sprint(len(pa.spots))))
		for k, s := range pa.spots {
			st := ck.station(pa, k, s, width)
			if a.Kind != Probes {
				channel++
				if s.channel > 0 {
					channel = s.channel
				}
				st.Channel = channel
			}
			if st.Planned != nil {
				used[st.ID] = true
			}
			plan.Stations = append(plan.Stations, st)
		}
		pa.res.Stations = len(pa.spots)
	}
	if err := ck.uniqueIDs(plan.Stations); err != nil {
		return err
	}
	return unknownAsBuilt(ck.req, used, plan.Stations)
}

// station returns the k-th station of a placed array at spot s, moved to its
// as-built position if the request has one (then Planned is set), with its
// base, its place in the jet frame and its polar angle. width is the number
// of digits of generated IDs. The channel is left for the caller.
func (ck *checker) station(pa *placedArray, k int, s spot, width int) Station {
	req := ck.req
	a := &pa.res.Spec
	st := Station{
		Array:     a.Name,
		Kind:      a.Kind,
		Index:     k + 1,
		Mic:       s.mic,
		Stand:     pa.stand,
		Nominal:   s.nominal,
		Incidence: a.Incidence,
	}
	if st.Incidence == 0 {
		st.Incidence = NormalIncidence
	}
	st.ID = s.name
	if st.ID == "" {
		st.ID = fmt.Sprintf("%s-%0*d", a.Name, width, k+1)
	}
	boom := 0.0
	if pa.stand != nil {
		boom = pa.stand.BoomLength
	}
	plannedBase := standBase(s.mic, pa.centre, boom, req.Exit, a)
	ab, measured := req.AsBuilt[st.ID]
	switch {
	case measured:
		planned := s.mic
		st.Planned, st.PlannedBase = &planned, &plannedBase
		st.Measurement = Measured
		s.mic, st.Mic = ab.Mic, ab.Mic
		if pa.stand == nil {
			s.mic.Z, st.Mic.Z = 0, 0
		}
	case req.AsBuilt != nil:
		st.Measurement = NotMeasured
	}
	st.Base = standBase(s.mic, pa.centre, boom, req.Exit, a)
	if measured && ab.Base != nil {
		st.Base, st.BaseMeasured = *ab.Base, true
	}
	st.Height = s.mic.Z
	rel := req.Exit.ToJet(s.mic)
	cx := req.Exit.ToJet(seenFrom(req, a)).X
	q := geometry.JetPoint{X: rel.X - cx, R: rel.R}
	st.Jet = rel
	st.Radius = q.Distance()
	st.Polar = req.Convention.FromDownstream(q.Polar())
	st.AimAt = ck.aimPoint(ck.points)
	return st
}

// unknownAsBuilt returns an error naming the as-built positions that match
// no station of the plan (used names those that did).
func unknownAsBuilt(req *Request, used map[string]bool, stations []Station) error {
	var unknown []string
	for id := range req.AsBuilt {
		if !used[id] {
			unknown = append(unknown, id)
		}
	}
	if len(unknown) == 0 {
		return nil
	}
	sort.Strings(unknown)
	like := "it has none"
	if len(stations) > 0 {
		like = "its stations are named like " + stations[0].ID
	}
	return fmt.Errorf("%w: %s %s not in the plan (%s)", ErrAsBuilt, plural(len(unknown), "station", "stations"), strings.Join(unknown, ", "), like)
}

// indexSolids indexes the cell's obstacles, the stands' footprints and the
// stands as sight-line solids (a stand is its pole and its base).
func (ck *checker) indexSolids(stations []Station) {
	var obst []geometry.Solid
	obst = append(obst, ck.req.Cell.Solids()...)
	ck.obstacles = geometry.NewIndex(obst)
	stands := make([]geometry.Solid, len(stations))
	ck.feet = make([]foot, len(stations))
	sight := make([]float64, len(stations))
	for i := range stations {
		st := &stations[i]
		r, top := flushRadius, math.Max(st.Mic.Z, flushHeight)
		if st.Stand != nil {
			r = math.Max(st.Stand.BaseRadius, st.Stand.PoleDiameter/2)
		}
		ck.feet[i] = foot{at: st.Base, r: r}
		ck.maxFoot = math.Max(ck.maxFoot, r)
		sr := r
		if st.Stand != nil {
			sr = st.Stand.PoleDiameter / 2
		}
		sight[i] = sr
		stands[i] = geometry.Solid{Name: st.ID, Footprint: geometry.Circle(st.Base, sr), ZMin: 0, ZMax: top}
	}
	ck.stands = geometry.NewIndex(stands)
	ck.spread = newStandTree(ck.feet, sight)
}

// checkStations runs every check on every station and counts the verdicts.
func (ck *checker) checkStations(plan *Plan, placed []placedArray) {
	si := 0
	for ai := range placed {
		pa := &placed[ai]
		cx := ck.req.Exit.ToJet(seenFrom(ck.req, &pa.res.Spec)).X
		for range pa.spots {
			ck.evaluate(&plan.Stations[si], si, &pa.res.Spec, cx)
			si++
		}
	}
	for i := range plan.Stations {
		switch plan.Stations[i].Status {
		case OK:
			plan.OK++
		case Warn:
			plan.Warn++
		case Blocked:
			plan.Blocked++
		}
	}
}

// summarisePlan adds the array summaries, the absorption table and the
// plan's warnings.
func (ck *checker) summarisePlan(plan *Plan, placed []placedArray) {
	for ai := range placed {
		pa := &placed[ai]
		ck.summarise(&pa.res, plan)
		plan.Arrays = append(plan.Arrays, pa.res)
	}
	plan.Absorption = ck.absorptionTable(plan.Arrays, plan.Stations)
	plan.Crew = ck.crewExposures()
	plan.Impingements = impingements(ck.req, ck.obstacles, ck.points)
	ck.imps = plan.Impingements
	plan.Warnings = append(append(append(append([]string(nil), ck.req.Notes...), ck.warnings(ck.atm)...), ck.noiseWarnings(plan)...), ck.coaxialNoiseWarnings()...)
	plan.Warnings = append(plan.Warnings, ck.slowJetWarnings()...)
}

func indexOf(points []PointResult, name string) int {
	for i := range points {
		if points[i].Name == name {
			return i
		}
	}
	return 0
}

// aimPoint returns where free-field microphones are aimed: the centre of
// the source region of the governing point, on the axis at the end of its
// potential core (acoustics reference sheet §5.2: "aim at the nozzle exit or
// the estimated source centroid").
func (ck *checker) aimPoint(points []PointResult) r3.Vec {
	return ck.req.Exit.ToCell(geometry.JetPoint{X: points[ck.order[0]].CoreNominal})
}

func (ck *checker) uniqueIDs(st []Station) error {
	seen := map[string]bool{}
	for _, s := range st {
		if seen[s.ID] {
			return fmt.Errorf("%w: two stations are named %q", ErrRequest, s.ID)
		}
		seen[s.ID] = true
	}
	return nil
}

// wallNeed is the clearance from the boundary that the automatic radius
// keeps: the user's wall clearance and, with treated walls, a quarter
// wavelength at the band's low end.
func (ck *checker) wallNeed() float64 { return math.Max(ck.lim.WallClearance, ck.quarter) }

// roomRadius returns the largest radius of arc a at which every requested
// angle keeps the stand, base and microphone at least wallNeed from the
// boundary, on or above the floor and below the ceiling; +Inf in an
// unbounded cell with no ceiling limit.
func (ck *checker) roomRadius(pl placer, a *Array) float64 {
	cell := &ck.req.Cell
	need := ck.wallNeed()
	poleR, baseR, boom := flushRadius, flushRadius, 0.0
	if pl.stand != nil {
		poleR, baseR, boom = pl.stand.PoleDiameter/2, pl.stand.BaseRadius, pl.stand.BoomLength
	}
	footR := math.Max(poleR, baseR)
	centre := pl.centre(a)
	ok := func(thetaJ, r float64) bool {
		m := pl.arcPoint(a, thetaJ, r)
		if m.Z < 0 || m.Z > cell.Ceiling-ck.quarter {
			return false
		}
		if !cell.Bounded() {
			return true
		}
		b := standBase(m, centre, boom, ck.req.Exit, a)
		return cell.WallDistance(b)-footR >= need && cell.WallDistance(orb.Point{m.X, m.Y}) >= need
	}
	best := math.Inf(1)
	span := 1e4
	if cell.Bounded() {
		e := cell.Extent()
		span = 2 * math.Hypot(e.Max[0]-e.Min[0], e.Max[1]-e.Min[1])
	}
	for _, th := range steps(a.From, a.To, a.Step) {
		tj := ck.req.Convention.ToDownstream(th)
		const n = 400
		lo, hi := 0.0, math.Inf(1)
		for k := 1; k <= n; k++ {
			r := span * float64(k) / n
			if !ok(tj, r) {
				hi = r
				break
			}
			lo = r
		}
		if math.IsInf(hi, 1) {
			continue
		}
		for k := 0; k < 50; k++ {
			mid := (lo + hi) / 2
			if ok(tj, mid) {
				lo = mid
			} else {
				hi = mid
			}
		}
		best = math.Min(best, lo)
	}
	return best
}

// validate checks what the planner cannot work without; the layout
// package validates everything else with file positions.
func validate(req *Request) error {
	bad := func(format string, a ...any) error {
		return fmt.Errorf("%w: "+format, append([]any{ErrRequest}, a...)...)
	}
	switch {
	case req == nil:
		return bad("no request")
	case len(req.Points) == 0:
		return bad("no operating points")
	case req.Convention != FromInlet && req.Convention != FromJetAxis:
		return bad("no polar-angle convention")
	case !(req.Band.Low > 0) || !(req.Band.High > req.Band.Low):
		return bad("band %g–%g Hz: want 0 < low < high", req.Band.Low, req.Band.High)
	}
	for _, a := range req.Arrays {
		switch a.Kind {
		case Arc:
			if !a.AutoRadius && !(a.Radius > 0) {
				return bad("array %s: radius %g m: want > 0", a.Name, a.Radius)
			}
			if !(a.Step > 0) {
				return bad("array %s: polar step must be > 0", a.Name)
			}
		case Line:
			if !(a.Spacing > 0) && !(a.Step > 0) {
				return bad("array %s: want a spacing or a polar step > 0", a.Name)
			}
		case NearField:
			if !(a.Spacing > 0) {
				return bad("array %s: spacing must be > 0", a.Name)
			}
		case Ring:
			if !(a.AzStep > 0) || !(a.Radius > 0) {
				return bad("array %s: ring radius and azimuth step must be > 0", a.Name)
			}
		case Points, Probes:
			for _, f := range a.Fixed {
				if !finiteVec(f.At) {
					return bad("array %s: station %q: position %v is not a finite point", a.Name, f.Name, f.At)
				}
			}
		default:
			return bad("array %s: unknown kind", a.Name)
		}
	}
	for id, ab := range req.AsBuilt {
		if !finiteVec(ab.Mic) || (ab.Base != nil && (!finite(ab.Base[0]) || !finite(ab.Base[1]))) {
			return bad("as-built position of %s is not a finite point", id)
		}
	}
	return nil
}

func finite(v float64) bool   { return !math.IsNaN(v) && !math.IsInf(v, 0) }
func finiteVec(v r3.Vec) bool { return finite(v.X) && finite(v.Y) && finite(v.Z) }
