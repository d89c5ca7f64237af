package export

import (
	"encoding/csv"
	"encoding/json"
	"fmt"
	"io"
	"math"
	"strconv"

	"arcwright/internal/jet"
)

// plumeDoc is the plume command's JSON document. Field order is key order.
type plumeDoc struct {
	Format                    string       `json:"format"`
	FormatVersion             int          `json:"format_version"`
	Nozzle                    nozzleDoc    `json:"nozzle"`
	Condition                 conditionDoc `json:"condition"`
	Exit                      plumeExitDoc `json:"exit"`
	PotentialCore             num          `json:"potential_core_length_m"`
	PotentialCoreConservative num          `json:"potential_core_length_conservative_m"`
	Profile                   []profileDoc `json:"profile"`
	VelocityEnvelope          envelopeDoc  `json:"velocity_envelope"`
	HotEnvelope               envelopeDoc  `json:"hot_envelope"`
	NominalVelocityEnvelope   envelopeDoc  `json:"nominal_velocity_envelope"`
	NominalHotEnvelope        envelopeDoc  `json:"nominal_hot_envelope"`
	Buoyancy                  buoyancyDoc  `json:"buoyancy"`
	Warnings                  []string     `json:"warnings"`
}

type nozzleDoc struct {
	Kind               string `json:"kind"`
	EquivalentDiameter num    `json:"equivalent_diameter_m"`
	DesignMach         num    `json:"design_mach"`
	AspectRatio        num    `json:"aspect_ratio"`
}

type conditionDoc struct {
	NPR                num `json:"npr"`
	TotalTemperature   num `json:"total_temperature_k"`
	AmbientPressure    num `json:"ambient_pressure_pa"`
	AmbientTemperature num `json:"ambient_temperature_k"`
	VelocityLimit      num `json:"velocity_limit_m_s"`
	TemperatureLimit   num `json:"temperature_limit_k"`
}

type plumeExitDoc struct {
	Mach                  num    `json:"mach"`
	Velocity              num    `json:"velocity_m_s"`
	StaticTemperature     num    `json:"static_temperature_k"`
	Density               num    `json:"density_kg_m3"`
	FullyExpandedDiameter num    `json:"fully_expanded_diameter_m"`
	AcousticMach          num    `json:"acoustic_mach"`
	Reynolds              num    `json:"reynolds"`
	ConvectiveMach        num    `json:"convective_mach"`
	ExitMach              num    `json:"exit_plane_mach"`
	TotalTemperature      num    `json:"total_temperature_k"`
	DensityRatio          num    `json:"density_ratio"`
	EffectiveDiameter     num    `json:"effective_diameter_m"`
	MassFlow              num    `json:"mass_flow_kg_s"`
	Thrust                num    `json:"thrust_n"`
	Expansion             string `json:"expansion"`
	IdeallyExpanded       bool   `json:"ideally_expanded"`
	ShockCellSpacing      num    `json:"shock_cell_spacing_m"`
	MachDiskDistance      num    `json:"mach_disk_distance_m"`
}

type profileDoc struct {
	X                     num `json:"x_m"`
	XOverDj               num `json:"x_over_dj"`
	CenterlineVelocity    num `json:"centerline_velocity_m_s"`
	HalfVelocityRadius    num `json:"half_velocity_radius_m"`
	CenterlineTemperature num `json:"centerline_temperature_k"`
	CenterlineTotal       num `json:"centerline_total_temperature_k"`
	CoreRadius            num `json:"core_radius_m"`
	MixingLayerOuter      num `json:"mixing_layer_outer_m"`
}

type envelopeDoc struct {
	LimitMS     *num     `json:"limit_m_s,omitempty"`
	LimitK      *num     `json:"limit_k,omitempty"`
	Length      num      `json:"length_m"`
	MaxRadius   num      `json:"max_radius_m"`
	MaxRadiusAt num      `json:"max_radius_at_m"`
	Tolerance   num      `json:"outline_tolerance_m"`
	Points      [][2]num `json:"points"`
}

type buoyancyDoc struct {
	ReducedGravity num `json:"reduced_gravity_m_s2"`
	MomentumLength num `json:"momentum_length_m"`
	Onset          num `json:"bending_onset_m"`
}

func newEnvelopeDoc(e *jet.Envelope) envelopeDoc {
	d := envelopeDoc{Length: metres(e.Length), MaxRadius: metres(e.MaxRadius), MaxRadiusAt: metres(e.MaxRadiusAt), Tolerance: metres(e.Tolerance), Points: [][2]num{}}
	lim := sig(e.Limit)
	if e.Zone == jet.HotZone {
		d.LimitK = &lim
	} else {
		d.LimitMS = &lim
	}
	for _, p := range e.Points {
		d.Points = append(d.Points, [2]num{metres(p[0]), metres(p[1])})
	}
	return d
}

// PlumeJSON writes the prediction p as JSON, with a profile row at each
// axial distance in xs (m). Keys carry their SI units; NaN and infinities
// are written as null.
func PlumeJSON(w io.Writer, p *jet.Plume, xs []float64) error {
	e := p.Exit()
	n := p.Nozzle()
	c := p.Condition()
	lim := p.Limits()
	b := p.Buoyancy()
	d := plumeDoc{
		Format:        "arcwright-plume",
		FormatVersion: 1,
		Nozzle:        nozzleDoc{Kind: n.Kind.String(), EquivalentDiameter: metres(n.EquivalentDiameter()), DesignMach: sig(e.DesignMach), AspectRatio: sig(n.AspectRatio())},
		Condition: conditionDoc{NPR: sig(c.Primary.NPR), TotalTemperature: sig(e.TotalTemperature),
			AmbientPressure: sig(c.Ambient.Pressure), AmbientTemperature: sig(c.Ambient.Temperature),
			VelocityLimit: sig(lim.Velocity), TemperatureLimit: sig(lim.Temperature)},
		Exit: plumeExitDoc{
			Mach: sig(e.Mach), Velocity: sig(e.Velocity), StaticTemperature: sig(e.StaticTemperature), Density: sig(e.Density),
			FullyExpandedDiameter: metres(e.FullyExpandedDiameter), AcousticMach: sig(e.AcousticMach), Reynolds: sig(e.Reynolds),
			ConvectiveMach: sig(e.ConvectiveMach), ExitMach: sig(e.ExitMach), TotalTemperature: sig(e.TotalTemperature),
			DensityRatio: sig(e.DensityRatio), EffectiveDiameter: metres(e.EffectiveDiameter), MassFlow: sig(e.MassFlow), Thrust: sig(e.Thrust),
			Expansion: e.Expansion.String(), IdeallyExpanded: e.IdeallyExpanded(),
			ShockCellSpacing: metres(e.ShockCellSpacing), MachDiskDistance: metres(e.MachDiskDistance),
		},
		PotentialCore:             metres(p.CoreLength(jet.Nominal)),
		PotentialCoreConservative: metres(p.CoreLength(jet.Conservative)),
		Profile:                   []profileDoc{},
		VelocityEnvelope:          newEnvelopeDoc(p.Envelope(jet.VelocityZone, jet.Conservative)),
		HotEnvelope:               newEnvelopeDoc(p.Envelope(jet.HotZone, jet.Conservative)),
		NominalVelocityEnvelope:   newEnvelopeDoc(p.Envelope(jet.VelocityZone, jet.Nominal)),
		NominalHotEnvelope:        newEnvelopeDoc(p.Envelope(jet.HotZone, jet.Nominal)),
		Buoyancy:                  buoyancyDoc{ReducedGravity: sig(b.ReducedGravity), MomentumLength: metres(b.MomentumLength), Onset: metres(b.Onset)},
		Warnings:                  []string{},
	}
	for _, x := range xs {
		ml := p.MixingLayer(x)
		d.Profile = append(d.Profile, profileDoc{
			X: metres(x), XOverDj: sig(x / e.FullyExpandedDiameter),
			CenterlineVelocity: sig(p.CenterlineVelocity(x)), HalfVelocityRadius: metres(p.HalfVelocityRadius(x)),
			CenterlineTemperature: sig(p.CenterlineTemperature(x)), CenterlineTotal: sig(p.TotalTemperature(x, 0)),
			CoreRadius: metres(ml.Inner), MixingLayerOuter: metres(ml.Outer),
		})
	}
	for _, f := range p.Flags() {
		d.Warnings = append(d.Warnings, f.String())
	}
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	enc.SetEscapeHTML(false)
	if err := enc.Encode(&d); err != nil {
		return fmt.Errorf("export: writing JSON: %w", err)
	}
	return nil
}

// PlumeCSV writes the profile of p at the axial distances xs (m) as CSV.
func PlumeCSV(w io.Writer, p *jet.Plume, xs []float64) error {
	e := p.Exit()
	cw := csv.NewWriter(w)
	cw.Write([]string{"x_m", "x_over_dj", "centerline_velocity_m_s", "half_velocity_radius_m", "centerline_temperature_k", "centerline_total_temperature_k", "core_radius_m", "mixing_layer_outer_m"})
	g := func(v float64) string {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			return ""
		}
		return strconv.FormatFloat(v, 'g', significant, 64)
	}
	for _, x := range xs {
		ml := p.MixingLayer(x)
		cw.Write([]string{cellMetres(x), g(x / e.FullyExpandedDiameter), g(p.CenterlineVelocity(x)), cellMetres(p.HalfVelocityRadius(x)),
			g(p.CenterlineTemperature(x)), g(p.TotalTemperature(x, 0)), cellMetres(ml.Inner), cellMetres(ml.Outer)})
	}
	cw.Flush()
	if err := cw.Error(); err != nil {
		return fmt.Errorf("export: writing CSV: %w", err)
	}
	return nil
}
