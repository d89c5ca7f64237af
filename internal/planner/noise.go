package planner

import (
	"fmt"
	"math"

	"github.com/paulmach/orb"
	"github.com/paulmach/orb/planar"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/acoustics"
	"arcwright/internal/geometry"
	"arcwright/internal/jet"
	"arcwright/internal/units"
)

// CheckLevel is the predicted OASPL at the microphone for the loudest
// operating point, dB, and whether the station's microphone can take it.
const CheckLevel = "oaspl_db"

// DefaultRoomAbsorption is the average absorption coefficient assumed for a
// hard-walled cell whose layout gives neither an absorption coefficient nor
// a reverberation time: 0.02, bare painted concrete and steel (common
// practice; low on purpose, so that the reverberant field is not
// underestimated). The plan warns when it is used.
const DefaultRoomAbsorption = 0.02

// DefaultEarHeight is the height of a crew member's ears above the floor
// when a crew position gives none, m (1.6 m standing; common practice).
const DefaultEarHeight = 1.6

// Noise is what the layout says about the room's acoustics and the noise
// contours to draw.
type Noise struct {
	// RoomAbsorption is the average absorption coefficient ᾱ of a
	// hard-walled cell, MinRoomAbsorption–MaxRoomAbsorption; 0 means not
	// given.
	RoomAbsorption float64
	// Reverberation is the reverberation time T60 of a hard-walled cell, s,
	// turned into ᾱ by Eyring's formula (Eyring 1930; Sabine's overstates
	// the absorption of a dead room); 0 means not given.
	Reverberation float64
	// Contours are A-weighted levels, dB(A), the sheet draws as contours
	// besides 85 dB(A) and 140 dB(C) peak.
	Contours []float64
}

// Crew is a place where people stay during runs.
type Crew struct {
	Name string
	// At is the position of the ears, cell frame, m.
	At r3.Vec
	// Hours is the time spent there per day during runs, h.
	Hours float64
	Line  int // line in the layout file, for messages; 0 unknown
}

// Level is a station's predicted level for one operating point.
type Level struct {
	Point       string
	OASPL       float64 // dB re 20 µPa
	AWeighted   float64 // dB(A)
	Peak        float64 // C-weighted peak estimate, dB(C)
	Uncertainty float64 // ± dB on OASPL
}

// CrewExposure is a crew position's exposure for one operating point.
type CrewExposure struct {
	Name, Point string
	At          r3.Vec
	Hours       float64
	AWeighted   float64 // dB(A) at the position
	Peak        float64 // C-weighted peak estimate, dB(C)
	// DailyExposure is L_EX,8h for Hours at AWeighted, dB(A).
	DailyExposure float64
	// AllowedHours is the time allowed at AWeighted under the NIOSH REL,
	// h, at most MaxAllowedHours.
	AllowedHours float64
	Class        acoustics.ExposureClass
	// InZone is true when a person standing here is inside (or within the
	// margin of) a velocity or hot zone of the point: the status is blocked
	// whatever the noise.
	InZone bool
	Status Verdict
	Reason string
}

// NoiseJet returns the fully expanded jet of e as the acoustics package's
// noise models take it.
func NoiseJet(e jet.Exit) acoustics.Jet {
	md := e.DesignMach
	if md < 1 {
		md = 1 // a subsonic design radiates no shock noise; β is unused then
	}
	return acoustics.Jet{
		Velocity:         e.Velocity,
		Density:          e.Density,
		Diameter:         e.FullyExpandedDiameter,
		TotalTemperature: e.TotalTemperature,
		Mach:             e.Mach,
		DesignMach:       md,
		ShockFree:        !e.ShockContaining(),
	}
}

// noiseModel holds what level predictions share: one source per operating
// point, the room constant and the floor.
type noiseModel struct {
	sources []*acoustics.NoiseSource
	roomR   float64 // room constant, m²; 0 without a reverberant field
	alpha   float64 // the average absorption coefficient used; 0 without a room
	assumed bool    // alpha is DefaultRoomAbsorption
	floor   geometry.Surface

	// sourceX are the axial source positions of each point, m from the
	// exit (two for a coaxial jet, see JetNoiseSource).
	sourceX [][]float64
}

// newNoiseModel predicts the noise source of every point and the room.
func newNoiseModel(req *Request, points []PointResult, atm acoustics.Atmosphere) (*noiseModel, error) {
	m := &noiseModel{floor: req.Cell.Floor}
	for k := range points {
		s, xs, err := JetNoiseSource(points[k].Plume, atm)
		if err != nil {
			return nil, fmt.Errorf("%w: operating point %s: noise: %w", ErrRequest, points[k].Name, err)
		}
		m.sources = append(m.sources, s)
		m.sourceX = append(m.sourceX, xs)
	}
	c := &req.Cell
	volume, surface, ok := RoomSize(c)
	if !ok {
		return m, nil
	}
	switch n := req.Noise; {
	case n.RoomAbsorption != 0:
		m.alpha = n.RoomAbsorption
	case n.Reverberation != 0:
		m.alpha = acoustics.EyringAbsorption(volume, surface, n.Reverberation)
		if !(m.alpha >= MinRoomAbsorption && m.alpha <= MaxRoomAbsorption) {
			return nil, fmt.Errorf("%w: noise: the reverberation time %g s gives an average absorption coefficient of %.3g for this room (Eyring); want %g–%g: %s", ErrRequest, n.Reverberation, m.alpha, MinRoomAbsorption, MaxRoomAbsorption, ReverberationRange(volume, surface))
		}
	default:
		m.alpha, m.assumed = DefaultRoomAbsorption, true
	}
	if !(m.alpha >= MinRoomAbsorption && m.alpha <= MaxRoomAbsorption) {
		return nil, fmt.Errorf("%w: noise: average absorption coefficient %g: want %g–%g", ErrRequest, m.alpha, MinRoomAbsorption, MaxRoomAbsorption)
	}
	m.roomR = acoustics.RoomConstant(surface, m.alpha)
	return m, nil
}

// Plausible range of a hard-walled cell's average absorption coefficient
// ᾱ, given or from a reverberation time (a guard of ours against slips: a
// room of bare concrete has about 0.02, a fully treated one above 0.9;
// common practice). The reverberant field grows without bound as ᾱ → 0.
const (
	MinRoomAbsorption = 0.01
	MaxRoomAbsorption = 0.99
)

// RoomSize returns the volume (m³) and inner surface area (m²) of a
// hard-walled cell, and false when the cell has no reverberant field (not
// hard-walled, unbounded or open to the sky).
func RoomSize(c *geometry.Cell) (volume, surface float64, ok bool) {
	if c.Kind != geometry.HardWalled || !c.Bounded() || math.IsInf(c.Ceiling, 1) {
		return 0, 0, false
	}
	area := math.Abs(planar.Area(c.Boundary))
	perim := planar.Length(c.Boundary)
	return area * c.Ceiling, 2*area + perim*c.Ceiling, true
}

// ReverberationRange says which reverberation times give a plausible
// average absorption coefficient (Eyring) in a room of volume volume (m³)
// and surface surface (m²): "want 0.076 s to 34.5 s for this room".
func ReverberationRange(volume, surface float64) string {
	// T60 = 0.161·V/(−S·ln(1 − ᾱ)) (Eyring 1930), at the ends of the range
	t := func(a float64) float64 { return 0.161 * volume / (-surface * math.Log1p(-a)) }
	return fmt.Sprintf("want %.2g s to %.3g s for this room (%.0f m³, %.0f m² of walls, floor and ceiling)", t(MaxRoomAbsorption), t(MinRoomAbsorption), volume, surface)
}

// levelAt predicts the levels of point k at pos (cell frame, m): spherical
// spreading from the source at the end of the nominal potential core (the
// source position of the source-offset and floor checks), air absorption,
// the floor image (over a hard floor the band-averaged coherent sum; over
// grass at least the energy sum, see acoustics.Path.SoftFloor; none over a
// treated floor) and the room's reverberant field. A
// coaxial jet has a second candidate source position ([JetNoiseSource]);
// the louder of the two counts.
func (ck *checker) levelAt(k int, pos r3.Vec) (acoustics.Levels, error) {
	var loud acoustics.Levels
	for i, x := range ck.noise.sourceX[k] {
		l, err := ck.levelFrom(k, x, pos)
		if err != nil {
			return acoustics.Levels{}, err
		}
		if i == 0 || l.OASPL > loud.OASPL {
			loud = l
		}
	}
	return loud, nil
}

// levelFrom predicts the levels of point k at pos (cell frame, m) from the
// source at xs on the jet axis (m from the exit).
func (ck *checker) levelFrom(k int, xs float64, pos r3.Vec) (acoustics.Levels, error) {
	p := &ck.points[k]
	f := ck.req.Exit
	q := f.ToJet(pos)
	rel := geometry.JetPoint{X: q.X - xs, R: q.R}
	path := acoustics.Path{Distance: rel.Distance(), Polar: rel.Polar(), RoomConstant: ck.noise.roomR}
	if dj := p.Exit.FullyExpandedDiameter; !(path.Distance >= acoustics.MinSourceDistance*dj) {
		return acoustics.Levels{}, fmt.Errorf("%s from the source position of %s, within %g jet diameters (%s): a far-field prediction does not apply there", ck.m(path.Distance), p.Name, acoustics.MinSourceDistance, ck.m(acoustics.MinSourceDistance*dj))
	}
	if fl := ck.noise.floor; (fl == geometry.Hard || fl == geometry.Grass) && pos.Z >= 0 {
		path.SoftFloor = fl == geometry.Grass
		src := f.ToCell(geometry.JetPoint{X: xs})
		d := r3.Sub(pos, r3.Vec{X: src.X, Y: src.Y, Z: -src.Z})
		path.ImageDistance = r3.Norm(d)
		if path.ImageDistance > 0 {
			// the jet axis is horizontal, so the image jet's axis is the same
			path.ImagePolar = math.Acos(math.Max(-1, math.Min(1, r3.Dot(d, f.Axis())/path.ImageDistance)))
		}
	}
	return ck.noise.sources[k].At(path, nil)
}

// microphone returns the microphone the station's array or stand names, or
// nil.
func microphoneOf(st *Station, arr *Array) *acoustics.Microphone {
	if arr.Microphone != nil {
		return arr.Microphone
	}
	if st.Stand != nil {
		return st.Stand.Microphone
	}
	return nil
}

// levelCheck predicts the station's levels for every point and, for
// microphones, checks the loudest against the microphone.
func (ck *checker) levelCheck(st *Station, arr *Array, t *tally) {
	st.Levels = make([]Level, 0, len(ck.points))
	loud := -1
	var bad error
	for k := range ck.points {
		l, err := ck.levelAt(k, st.Mic)
		if err != nil {
			// one entry per point all the same, never read as predicted
			nan := math.NaN()
			st.Levels = append(st.Levels, Level{Point: ck.points[k].Name, OASPL: nan, AWeighted: nan, Peak: nan, Uncertainty: nan})
			if bad == nil {
				bad = err
			}
			continue
		}
		st.Levels = append(st.Levels, Level{Point: ck.points[k].Name, OASPL: l.OASPL, AWeighted: l.AWeighted, Peak: l.Peak, Uncertainty: l.Uncertainty})
		if loud < 0 || l.OASPL > st.Levels[loud].OASPL {
			loud = len(st.Levels) - 1
		}
	}
	if st.Kind == Probes {
		return
	}
	if bad != nil || loud < 0 {
		t.add(Check{Name: CheckLevel, Value: math.NaN(), Unit: "dB", Verdict: Blocked,
			Reason: fmt.Sprintf("the level could not be predicted: %v", bad)})
		return
	}
	l := st.Levels[loud]
	top := ck.req.Band.High
	c := Check{Name: CheckLevel, Value: l.OASPL, Unit: "dB", Verdict: OK, Point: l.Point}
	head := fmt.Sprintf("%.0f dB OASPL (±%.0f dB), %.0f dB(A), peak about %.0f dB(C) for %s", l.OASPL, l.Uncertainty, l.AWeighted, l.Peak, l.Point)
	if st.Kind == NearField {
		head += " (a far-field prediction: near-field levels differ)"
	}
	suggest := "no size in the typical-values table fits: split the band or choose from data sheets"
	if cls, ok := acoustics.SmallestFit(l.OASPL, top); ok {
		suggest = fmt.Sprintf("a %s microphone fits (typically %s and %.0f dB; from memory, check the data sheet)", cls.Name, frequencyWords(cls.UpperFrequencyLow), cls.MaxLevelLow)
	}
	m := microphoneOf(st, arr)
	if m == nil {
		c.Reason = head + "; " + suggest
		t.add(c)
		return
	}
	margin := m.LevelMargin(l.OASPL)
	var problems []string
	if margin < 0 {
		problems = append(problems, fmt.Sprintf("with the %.0f dB crest allowance it exceeds the %s microphone's %.0f dB limit by %.0f dB", acoustics.CrestAllowance, m.Name, m.MaxLevel, -margin))
	}
	if m.UpperFrequency > 0 && top > m.UpperFrequency {
		problems = append(problems, fmt.Sprintf("the band reaches %s, above the %s microphone's %s", frequencyWords(top), m.Name, frequencyWords(m.UpperFrequency)))
	}
	if len(problems) == 0 {
		c.Reason = fmt.Sprintf("%s; the %s microphone's %.0f dB limit leaves %.0f dB above the %.0f dB crest allowance", head, m.Name, m.MaxLevel, margin, acoustics.CrestAllowance)
		t.add(c)
		return
	}
	c.Verdict = Warn
	c.Reason = head + ": " + joinWords(problems) + "; " + suggest
	t.add(c)
}

// frequencyWords prints a frequency, Hz, to three figures.
func frequencyWords(f float64) string {
	if f >= 1e3 {
		return fmt.Sprintf("%.3g kHz", f/1e3)
	}
	return fmt.Sprintf("%.3g Hz", f)
}

// joinWords joins phrases with commas and a final "and".
func joinWords(s []string) string {
	switch len(s) {
	case 0:
		return ""
	case 1:
		return s[0]
	}
	out := s[0]
	for _, w := range s[1 : len(s)-1] {
		out += ", " + w
	}
	return out + " and " + s[len(s)-1]
}

// crewExposures predicts every crew position's exposure for every point.
func (ck *checker) crewExposures() []CrewExposure {
	var out []CrewExposure
	for _, c := range ck.req.Crew {
		for k := range ck.points {
			e := CrewExposure{Name: c.Name, Point: ck.points[k].Name, At: c.At, Hours: c.Hours}
			if l, err := ck.levelAt(k, c.At); err != nil {
				// never passed as safe: no time allowed
				e.AWeighted, e.Peak, e.DailyExposure, e.AllowedHours = math.NaN(), math.NaN(), math.NaN(), 0
				e.Class, e.Status = acoustics.AboveLimit, Blocked
				e.Reason = "the level could not be predicted (" + err.Error() + ")"
			} else {
				ck.grade(&e, l)
			}
			// a zone outranks the noise: hearing protection is no help there
			if zone := ck.crewZone(k, c.At); zone != "" {
				e.Status, e.InZone = Blocked, true
				e.Reason = zone + ": no one may stand here during its runs; " + e.Reason
				out = append(out, e)
				continue
			}
			if cell := &ck.req.Cell; cell.Bounded() && cell.Kind != geometry.OutdoorPad && !cell.Contains(orb.Point{c.At.X, c.At.Y}) {
				e.Reason += "; outside the cell, the level leaves out the walls' sound insulation (an upper bound)"
			}
			switch e.Status {
			case Blocked:
				e.Reason += ": do not stay here during runs of " + e.Point + " without hearing protection chosen under the site's hearing-conservation procedures"
			case Warn:
				e.Reason += ": hearing protection and the site's procedures apply"
			}
			out = append(out, e)
		}
	}
	return out
}

// grade sets e's levels, exposure, allowed time and status from the levels
// l at the position.
func (ck *checker) grade(e *CrewExposure, l acoustics.Levels) {
	e.AWeighted, e.Peak = l.AWeighted, l.Peak
	e.DailyExposure = acoustics.DailyExposure(l.AWeighted, e.Hours)
	e.AllowedHours = math.Min(acoustics.NIOSHAllowedHours(l.AWeighted), MaxAllowedHours)
	e.Class = acoustics.ClassifyExposure(e.DailyExposure, e.Peak)
	over := e.Hours > e.AllowedHours
	switch {
	case e.Class == acoustics.AboveLimit || over || e.Peak >= acoustics.NIOSHCeilingPeak:
		e.Status = Blocked
	case e.Class > acoustics.BelowAction:
		e.Status = Warn
	default:
		e.Status = OK
	}
	e.Reason = fmt.Sprintf("%.0f dB(A) (±%.0f dB), peak about %.0f dB(C): L_EX,8h %.0f dB(A) over %s h, %s (EU 2003/10/EC); NIOSH allows %s",
		l.AWeighted, l.Uncertainty, l.Peak, e.DailyExposure, hoursWords(e.Hours), e.Class, units.FormatHours(e.AllowedHours))
	// the estimate's upper end: a prediction is uncertain, and the limits
	// are not to be met only on the central value
	hi := l.Uncertainty
	upper := acoustics.ClassifyExposure(e.DailyExposure+hi, e.Peak+hi)
	overHi := e.Hours > acoustics.NIOSHAllowedHours(l.AWeighted+hi) || e.Peak+hi >= acoustics.NIOSHCeilingPeak
	switch {
	case upper > e.Class:
		e.Reason += fmt.Sprintf("; with the ±%.0f dB of the estimate, %s", hi, upper)
	case overHi && !over:
		e.Reason += fmt.Sprintf("; with the ±%.0f dB of the estimate, the NIOSH limit is passed", hi)
	default:
		return
	}
	if e.Status == OK {
		e.Status = Warn
	}
}

// MaxAllowedHours caps the NIOSH allowed time reported for a crew
// position, h: a day (tables print "> 24 h"; hours per day are at most 24).
const MaxAllowedHours = 24.0

// crewBodyRadius is the radius of the column a person standing at a crew
// position takes up, from the floor to the ears, m: 0.25 m, about half a
// man's shoulder breadth with room to turn (common practice, from memory).
// The zone check treats the person as a stand of this size, so a wall jet
// along the floor or a zone bent by buoyancy reaches the legs and body as
// it reaches a stand.
const crewBodyRadius = 0.25

// crewBody is the person at a crew position as a stand: a pole of the
// body's size from the floor to the ears.
var crewBody = Stand{Name: "person", BaseRadius: crewBodyRadius, PoleDiameter: 2 * crewBodyRadius}

// crewZone returns, for a person standing with the ears at pos (cell frame,
// m), the zone of point k, with the layout's margin, that reaches the
// person, in words, or "". It is the stations' zone check (straight, bent
// and attached zones, velocity and hot) run on a station whose stand is the
// person's body.
func (ck *checker) crewZone(k int, pos r3.Vec) string {
	p := &ck.points[k]
	st := &Station{Mic: pos, Base: orb.Point{pos.X, pos.Y}, Stand: &crewBody}
	fixed, boom := ck.hardware(st)
	bent := ck.bentProbes(st)
	for _, z := range []struct {
		zone jet.Zone
		env  *jet.Envelope
	}{{jet.VelocityZone, p.Velocity()}, {jet.HotZone, p.Hot()}} {
		h := ck.zoneHit(p, z.zone, z.env, fixed, boom, bent, math.Inf(1))
		switch {
		case math.IsNaN(h.c):
			return "the " + ck.zoneWords(z.zone, h) + " of " + p.Name + " (the clearance could not be evaluated)"
		case h.c < 0:
			return "inside the " + ck.zoneWords(z.zone, h) + " of " + p.Name
		case h.c < ck.lim.Margin:
			return fmt.Sprintf("%s from the %s of %s, inside the %s margin", ck.m(h.c), ck.zoneWords(z.zone, h), p.Name, ck.m(ck.lim.Margin))
		}
	}
	return ""
}

// hoursWords prints a number of hours.
func hoursWords(h float64) string { return fmt.Sprintf("%.3g", h) }

// noiseWarnings returns the plan's warnings about levels: an assumed room
// absorption and crew positions that pass a limit.
func (ck *checker) noiseWarnings(plan *Plan) []string {
	var w []string
	if ck.noise.assumed {
		w = append(w, fmt.Sprintf("the hard-walled cell's sound absorption is not given: the levels assume an average absorption coefficient of %.2f (bare concrete and steel); give noise.room_absorption or noise.reverberation_time", DefaultRoomAbsorption))
	}
	// one line per crew position: its loudest point that passes a limit
	for i := 0; i < len(plan.Crew); {
		j := i
		worst, n := -1, 0
		for ; j < len(plan.Crew) && plan.Crew[j].Name == plan.Crew[i].Name; j++ {
			if e := plan.Crew[j]; e.Status == Blocked {
				n++
				// a zone first (its reason says no one may stand there), then the loudest
				if w := &plan.Crew[max(worst, 0)]; worst < 0 || e.InZone && !w.InZone || e.InZone == w.InZone && !(e.AWeighted <= w.AWeighted) {
					worst = j
				}
			}
		}
		if worst >= 0 {
			e := plan.Crew[worst]
			others := ""
			if n > 1 {
				others = fmt.Sprintf(" (and %d other %s)", n-1, plural(n-1, "point", "points"))
			}
			w = append(w, fmt.Sprintf("crew position %s, %s%s: %s", e.Name, e.Point, others, e.Reason))
		}
		i = j
	}
	return w
}
