package export

import (
	"arcwright/internal/jet"
	"arcwright/internal/planner"
)

// stationDoc is one station.
type stationDoc struct {
	ID      string `json:"id"`
	Array   string `json:"array"`
	Kind    string `json:"kind"`
	Index   int    `json:"index"`
	Channel int    `json:"channel"`
	X       num    `json:"x_m"`
	Y       num    `json:"y_m"`
	Z       num    `json:"z_m"`
	BaseX   num    `json:"base_x_m"`
	BaseY   num    `json:"base_y_m"`
	Height  num    `json:"height_m"`
	// The nominal radius and polar angle are what the layout asks for,
	// null where it asks for none; Radius and Polar are the same
	// quantities as placed (equal to the nominal ones for a station placed
	// where the layout asks; see CSV). AcousticDistance and AcousticPolar
	// are the microphone's true distance and angle in space from its
	// array's centre on the axis or the nozzle exit, which the checks use.
	Radius           num        `json:"radius_m"`
	NominalRadius    num        `json:"nominal_radius_m"`
	Polar            num        `json:"polar_deg"`
	NominalPolar     num        `json:"nominal_polar_deg"`
	AcousticDistance num        `json:"acoustic_distance_m"`
	AcousticPolar    num        `json:"acoustic_polar_deg"`
	Jet              jetDoc     `json:"jet"`
	Stand            *string    `json:"stand"`
	Aim              string     `json:"aim"`
	AimAt            vecDoc     `json:"aim_at"`
	Status           string     `json:"status"`
	Governing        string     `json:"governing_point"`
	Levels           []levelDoc `json:"levels"`
	Checks           checksDoc  `json:"checks"`
	CheckDetails     []checkDoc `json:"check_details"`
	Reasons          []string   `json:"reasons"`
}

// jetDoc is a position in the jet frame.
type jetDoc struct {
	X       num `json:"x_m"`
	R       num `json:"r_m"`
	Azimuth num `json:"azimuth_deg"`
}

// checksDoc holds the value of each named check; null where the station has
// no such check or its value is NaN or ±Inf.
type checksDoc struct {
	VelocityClearance num   `json:"velocity_clearance_m"`
	HotClearance      num   `json:"hot_clearance_m"`
	WallClearance     num   `json:"wall_clearance_m"`
	LineOfSight       *bool `json:"line_of_sight"`
	FarFieldRatio     num   `json:"far_field_ratio"`
	GroundNull        num   `json:"ground_null_hz"`
	Absorption        num   `json:"absorption_db"`
	ObstacleClearance num   `json:"obstacle_clearance_m"`
	KeepOutClearance  num   `json:"keepout_clearance_m"`
	StandSpacing      num   `json:"stand_spacing_m"`
	HeightClearance   num   `json:"height_clearance_m"`
	Wavelengths       num   `json:"wavelengths"`
	FresnelRatio      num   `json:"fresnel_ratio"`
	SourceOffset      num   `json:"source_offset_db"`
	Inflow            num   `json:"inflow_m_s"`
	BuoyantPlume      *bool `json:"buoyant_plume"`
	OASPL             num   `json:"oaspl_db"`
}

// checkDoc is one check in full.
type checkDoc struct {
	Name    string `json:"name"`
	Value   num    `json:"value"`
	Unit    string `json:"unit"`
	Verdict string `json:"verdict"`
	Point   string `json:"point"`
	Reason  string `json:"reason"`
}

func newStationDoc(p *planner.Plan, s *planner.Station) stationDoc {
	status, _ := verdictName(s.Status)
	d := stationDoc{
		ID:               s.ID,
		Array:            s.Array,
		Kind:             kindName(s.Kind),
		Index:            s.Index,
		Channel:          s.Channel,
		X:                metres(s.Mic.X),
		Y:                metres(s.Mic.Y),
		Z:                metres(s.Mic.Z),
		BaseX:            metres(s.Base[0]),
		BaseY:            metres(s.Base[1]),
		Height:           metres(s.Height),
		Radius:           metres(p.PlacedRadius(s)),
		NominalRadius:    metres(p.NominalRadius(s)),
		Polar:            degrees(p.PlacedPolar(s)),
		NominalPolar:     degrees(s.Nominal),
		AcousticDistance: metres(s.Radius),
		AcousticPolar:    degrees(s.Polar),
		Jet:              jetDoc{X: metres(s.Jet.X), R: metres(s.Jet.R), Azimuth: degrees(s.Jet.Azimuth)},
		Aim:              aimName(s.Incidence),
		AimAt:            newVecDoc(s.AimAt),
		Status:           status,
		Governing:        s.Governing,
		Checks:           newChecksDoc(s),
		CheckDetails:     make([]checkDoc, len(s.Checks)),
		Reasons:          list(s.Reasons),
		Levels:           make([]levelDoc, len(s.Levels)),
	}
	if s.Stand != nil {
		name := s.Stand.Name
		d.Stand = &name
	}
	for i, l := range s.Levels {
		d.Levels[i] = levelDoc{Point: l.Point, OASPL: decibels(l.OASPL), AWeighted: decibels(l.AWeighted), Peak: decibels(l.Peak)}
	}
	for i, c := range s.Checks {
		v, _ := verdictName(c.Verdict)
		d.CheckDetails[i] = checkDoc{Name: c.Name, Value: checkNumber(c), Unit: c.Unit, Verdict: v, Point: c.Point, Reason: c.Reason}
	}
	return d
}

func newChecksDoc(s *planner.Station) checksDoc {
	m := func(name string) num { return metres(checkValue(s, name)) }
	g := func(name string) num { return sig(checkValue(s, name)) }
	return checksDoc{
		VelocityClearance: m(planner.CheckVelocity),
		HotClearance:      m(planner.CheckHot),
		WallClearance:     m(planner.CheckWall),
		// the sight value is the fraction of the source region in view:
		// true only when all of it is (the value is 1)
		LineOfSight:       flag(checkValue(s, planner.CheckSight)),
		FarFieldRatio:     g(planner.CheckFarField),
		GroundNull:        g(planner.CheckGround),
		Absorption:        g(planner.CheckAbsorption),
		ObstacleClearance: m(planner.CheckObstacle),
		KeepOutClearance:  m(planner.CheckKeepOut),
		StandSpacing:      m(planner.CheckSpacing),
		HeightClearance:   m(planner.CheckHeight),
		Wavelengths:       g(planner.CheckWavelength),
		FresnelRatio:      g(planner.CheckFresnel),
		SourceOffset:      g(planner.CheckSourceErr),
		Inflow:            g(planner.CheckInflow),
		BuoyantPlume:      flag(checkValue(s, planner.CheckBuoyancy)),
		OASPL:             decibels(checkValue(s, planner.CheckLevel)),
	}
}

// flag returns true when v is 1 (or more), false when it is less, and nil
// (null) when it is NaN (the check is missing or does not apply) or ±Inf.
func flag(v float64) *bool {
	if !finite(v) {
		return nil
	}
	b := v >= 1
	return &b
}

// pointDoc is one operating point. Envelope values are the conservative
// zones; the potential core is nominal (with the conservative one beside).
type pointDoc struct {
	Name             string   `json:"name"`
	NPR              num      `json:"nozzle_pressure_ratio"`
	Core             num      `json:"potential_core_length_m"`
	CoreConservative num      `json:"potential_core_conservative_length_m"`
	SourceEnd        num      `json:"source_region_end_m"`
	VelocityLength   num      `json:"velocity_envelope_length_m"`
	VelocityRadius   num      `json:"velocity_envelope_max_radius_m"`
	VelocityLimit    num      `json:"velocity_limit_m_s"`
	HotLength        num      `json:"hot_envelope_length_m"`
	HotRadius        num      `json:"hot_envelope_max_radius_m"`
	HotLimit         num      `json:"hot_limit_k"`
	Capture          *string  `json:"collector_capture"`
	CaptureReason    string   `json:"capture_reason"`
	CaptureDiameter  num      `json:"collector_plume_diameter_m"`
	Exit             exitDoc  `json:"exit"`
	Flags            []string `json:"flags"`
}

// exitDoc is the fully expanded exit state.
type exitDoc struct {
	Mach                  num    `json:"mach"`
	Velocity              num    `json:"velocity_m_s"`
	StaticTemperature     num    `json:"static_temperature_k"`
	TotalTemperature      num    `json:"total_temperature_k"`
	FullyExpandedDiameter num    `json:"fully_expanded_diameter_m"`
	Reynolds              num    `json:"reynolds"`
	Expansion             string `json:"expansion"`
}

// newPointDoc builds a point's document; collector reports whether the cell
// has an exhaust collector (without one the capture diameter is null).
func newPointDoc(p *planner.PointResult, collector bool) pointDoc {
	e := p.Exit
	d := pointDoc{
		Name:             p.Name,
		NPR:              sig(p.Condition.Primary.NPR),
		Core:             metres(p.CoreNominal),
		CoreConservative: metres(p.CoreConservative),
		SourceEnd:        metres(p.SourceEnd),
		VelocityLength:   num(nan),
		VelocityRadius:   num(nan),
		VelocityLimit:    num(nan),
		HotLength:        num(nan),
		HotRadius:        num(nan),
		HotLimit:         num(nan),
		CaptureReason:    p.CaptureReason,
		CaptureDiameter:  num(nan),
		Exit: exitDoc{
			Mach:                  sig(e.Mach),
			Velocity:              sig(e.Velocity),
			StaticTemperature:     sig(e.StaticTemperature),
			TotalTemperature:      sig(e.TotalTemperature),
			FullyExpandedDiameter: metres(e.FullyExpandedDiameter),
			Reynolds:              sig(e.Reynolds),
			Expansion:             expansionName(e.Expansion),
		},
		Flags: make([]string, len(p.Flags)),
	}
	if p.Plume != nil {
		v, h := p.Velocity(), p.Hot()
		d.VelocityLength, d.VelocityRadius, d.VelocityLimit = metres(v.Length), metres(v.MaxRadius), sig(v.Limit)
		d.HotLength, d.HotRadius, d.HotLimit = metres(h.Length), metres(h.MaxRadius), sig(h.Limit)
	}
	if v, ok := verdictName(p.Capture); ok {
		d.Capture = &v
	}
	if collector {
		d.CaptureDiameter = metres(p.CaptureDiameter)
	}
	for i, f := range p.Flags {
		d.Flags[i] = f.String()
	}
	return d
}

// expansionName returns the expansion state in words, "" when unset.
func expansionName(x jet.Expansion) string {
	if x == 0 {
		return ""
	}
	return x.String()
}
