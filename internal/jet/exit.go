package jet

import (
	"fmt"
	"math"
)

// Expansion says how the exit pressure of a nozzle compares with ambient.
type Expansion int

// Expansion states.
const (
	Subsonic      Expansion = iota + 1 // exit flow subsonic, exit pressure ambient
	Ideal                              // supersonic exit at ambient pressure: shock-free
	UnderExpanded                      // exit pressure above ambient: expansion fans and shock cells outside
	OverExpanded                       // exit pressure below ambient: oblique shocks at the lip and shock cells
	ShockInNozzle                      // a normal shock stands inside a convergent-divergent nozzle; subsonic exit
)

func (e Expansion) String() string {
	switch e {
	case Subsonic:
		return "subsonic"
	case Ideal:
		return "ideally expanded"
	case UnderExpanded:
		return "under-expanded"
	case OverExpanded:
		return "over-expanded"
	case ShockInNozzle:
		return "normal shock in nozzle"
	}
	return fmt.Sprintf("Expansion(%d)", int(e))
}

// idealPressureTolerance is the relative difference of exit and ambient
// pressure below which a supersonic jet counts as ideally expanded (common
// practice: nozzles are run "on design" to about ±1 % in NPR).
const idealPressureTolerance = 0.01

// Shock-cell constants.
const (
	// shockSpacingTam is the empirical average shock-cell spacing
	// coefficient, Ls/Dj = 1.1·sqrt(Mj²−1) (Tam, Jackson & Seiner 1985,
	// from memory).
	shockSpacingTam = 1.1
	// shockSpacingPack is the vortex-sheet value π/μ1 with μ1 = 2.40483 the
	// first zero of J0 (Prandtl 1904, Pack 1950), an upper bound.
	shockSpacingPack = math.Pi / 2.404825557695773
	// machDiskCoefficient gives the Mach-disk distance of a highly
	// under-expanded sonic jet, L/D = 0.645·sqrt(p0/pa) (Crist, Sherman &
	// Glass 1966, as retained by Franquet et al. 2015).
	machDiskCoefficient = 0.645
	// machDiskNPR is the nozzle pressure ratio above which a Mach disk forms
	// in a sonic jet, about 4 (Franquet et al. 2015 regime map).
	machDiskNPR = 4.0
)

// Exit is the fully expanded state of the jet: the state the flow reaches
// once its pressure has adjusted to ambient, which is what the plume
// correlations use.
type Exit struct {
	Mach                  float64 // fully expanded Mach number Mj
	ExitMach              float64 // Mach number in the nozzle exit plane
	DesignMach            float64 // nozzle design Mach number (1 for convergent exits)
	Velocity              float64 // fully expanded velocity Uj, m/s
	StaticTemperature     float64 // fully expanded static temperature Tj, K
	TotalTemperature      float64 // total temperature T0, K
	Density               float64 // fully expanded density ρj, kg/m³
	DensityRatio          float64 // ρj/ρa
	Diameter              float64 // area-equivalent nozzle exit diameter D, m
	FullyExpandedDiameter float64 // Dj from mass conservation, m
	EffectiveDiameter     float64 // Thring–Newby Dj·sqrt(ρj/ρa), m
	AcousticMach          float64 // Uj/a∞
	Reynolds              float64 // ρj·Uj·Dj/μ(Tj)
	// AmbientReynolds is Uj·D_eff/ν∞ = ρa·Uj·D_eff/μ(Ta): the Reynolds
	// number of the mixed jet, whose momentum flux is that of an ambient-
	// density jet of diameter D_eff and whose viscosity is the entrained
	// air's. It decides laminar or turbulent: a hot jet's own viscosity
	// would call a fast exhaust laminar.
	AmbientReynolds       float64
	SlotReynolds          float64   // ρj·Uj·height/μ(Tj) for rectangular exits, 0 otherwise
	ConvectiveMach        float64   // Uj/(aj + a∞), Papamoschou & Roshko 1988
	SoundSpeed            float64   // aj, m/s
	MassFlow              float64   // kg/s
	Thrust                float64   // momentum flux ṁ·Uj of the fully expanded jet, N
	ExitPressure          float64   // static pressure in the exit plane, Pa
	Expansion             Expansion // how the exit pressure compares with ambient
	ShockCellSpacing      float64   // average shock-cell spacing, m; 0 when shock-free
	ShockCellSpacingUpper float64   // vortex-sheet (upper) spacing, m; 0 when shock-free
	MachDiskDistance      float64   // distance of the Mach disk from the exit, m; 0 when none
	Gas                   Gas       // the (mixed) jet gas
	AmbientSoundSpeed     float64   // a∞, m/s
	AmbientDensity        float64   // ρa, kg/m³
}

// IdeallyExpanded reports whether the jet leaves the nozzle at ambient
// pressure (subsonic jets always do).
func (e Exit) IdeallyExpanded() bool { return e.Expansion == Subsonic || e.Expansion == Ideal }

// ShockContaining reports whether the jet carries a shock-cell train.
func (e Exit) ShockContaining() bool {
	return e.Expansion == UnderExpanded || e.Expansion == OverExpanded
}

// streamState is one stream's fully expanded state and mass flow.
type streamState struct {
	gas              Gas
	t0, mj, tj, uj   float64
	rho, mdot        float64
	exitMach, pe     float64
	designMach, area float64
	expansion        Expansion
}

// expand computes the fully expanded state of one stream leaving an exit of
// area area (m²) shaped for designMach (1 = convergent).
func expand(s Stream, a Ambient, area, designMach float64) streamState {
	g := s.gas()
	st := streamState{gas: g, t0: s.total(a), designMach: designMach, area: area}
	st.mj = g.MachFromNPR(s.NPR)
	st.tj = st.t0 / g.TemperatureRatio(st.mj)
	st.uj = st.mj * g.SoundSpeed(st.tj)
	st.rho = a.Pressure / (g.R * st.tj)
	p0 := s.NPR * a.Pressure
	// choked mass flow through a sonic throat of area at
	choked := func(at float64) float64 {
		t := st.t0 / g.TemperatureRatio(1)
		p := p0 / g.PressureRatio(1)
		return p / (g.R * t) * g.SoundSpeed(t) * at
	}
	switch {
	case designMach <= 1:
		if s.NPR <= g.CriticalNPR() {
			st.exitMach, st.pe, st.expansion = st.mj, a.Pressure, Subsonic
			st.mdot = st.rho * st.uj * area
		} else {
			st.exitMach, st.pe, st.expansion = 1, p0/g.PressureRatio(1), UnderExpanded
			st.mdot = choked(area)
		}
	default:
		ar := g.AreaRatio(designMach)
		throat := area / ar
		// below the first critical ratio the throat is not choked
		npr1 := g.PressureRatio(g.MachFromAreaRatio(ar, false))
		// a normal shock standing in the exit plane: the pressure behind
		// it is ambient (normal-shock relation, NACA Report 1135)
		shock := (2*g.Gamma*designMach*designMach - (g.Gamma - 1)) / (g.Gamma + 1)
		npr3 := g.PressureRatio(designMach) / shock
		switch {
		case s.NPR <= npr1:
			st.exitMach, st.pe, st.expansion = st.mj, a.Pressure, Subsonic
			st.mdot = st.rho * st.uj * area
		case s.NPR < npr3:
			st.exitMach, st.pe, st.expansion = st.mj, a.Pressure, ShockInNozzle
			st.mdot = choked(throat)
		default:
			st.exitMach = designMach
			st.pe = p0 / g.PressureRatio(designMach)
			st.mdot = choked(throat)
			switch r := st.pe/a.Pressure - 1; {
			case math.Abs(r) <= idealPressureTolerance:
				st.expansion = Ideal
			case r > 0:
				st.expansion = UnderExpanded
			default:
				st.expansion = OverExpanded
			}
		}
	}
	if st.expansion == UnderExpanded && math.Abs(st.pe/a.Pressure-1) <= idealPressureTolerance {
		st.expansion = Ideal
	}
	return st
}

// ExitState returns the fully expanded exit state of nozzle n at operating
// point c. A coaxial nozzle is replaced by one mixed jet that carries the
// same mass flow, momentum flux and total enthalpy as its two streams
// (conservation laws; the secondary exit is taken as convergent).
func ExitState(n Nozzle, c Condition) (Exit, error) {
	if err := c.Validate(n); err != nil {
		return Exit{}, err
	}
	a := c.Ambient
	p := expand(c.Primary, a, n.ExitArea(), n.designMach())
	e := Exit{
		DesignMach:        p.designMach,
		Diameter:          n.EquivalentDiameter(),
		ExitMach:          p.exitMach,
		ExitPressure:      p.pe,
		Expansion:         p.expansion,
		TotalTemperature:  p.t0,
		Gas:               p.gas,
		MassFlow:          p.mdot,
		Thrust:            p.mdot * p.uj,
		Velocity:          p.uj,
		StaticTemperature: p.tj,
	}
	if c.Secondary != nil {
		s := expand(*c.Secondary, a, n.SecondaryArea(), 1)
		m := p.mdot + s.mdot
		cp := (p.mdot*p.gas.Cp() + s.mdot*s.gas.Cp()) / m
		r := (p.mdot*p.gas.R + s.mdot*s.gas.R) / m
		e.Gas = Gas{Gamma: cp / (cp - r), R: r}
		e.MassFlow = m
		e.Thrust = p.mdot*p.uj + s.mdot*s.uj
		e.Velocity = e.Thrust / m
		e.TotalTemperature = (p.mdot*p.gas.Cp()*p.t0 + s.mdot*s.gas.Cp()*s.t0) / (m * cp)
		e.StaticTemperature = e.TotalTemperature - e.Velocity*e.Velocity/(2*cp)
		if s.expansion == UnderExpanded && e.Expansion != UnderExpanded {
			e.Expansion = UnderExpanded
		}
	}
	g := e.Gas
	e.SoundSpeed = g.SoundSpeed(e.StaticTemperature)
	e.Mach = e.Velocity / e.SoundSpeed
	e.Density = a.Pressure / (g.R * e.StaticTemperature)
	e.AmbientDensity = a.Density()
	e.AmbientSoundSpeed = a.SoundSpeed()
	e.DensityRatio = e.Density / e.AmbientDensity
	e.FullyExpandedDiameter = math.Sqrt(4 * e.MassFlow / (e.Density * e.Velocity * math.Pi))
	if e.Velocity == 0 {
		e.FullyExpandedDiameter = e.Diameter
	}
	e.EffectiveDiameter = e.FullyExpandedDiameter * math.Sqrt(e.DensityRatio)
	e.AcousticMach = e.Velocity / e.AmbientSoundSpeed
	mu := Viscosity(e.StaticTemperature)
	e.Reynolds = e.Density * e.Velocity * e.FullyExpandedDiameter / mu
	e.AmbientReynolds = e.AmbientDensity * e.Velocity * e.EffectiveDiameter / Viscosity(a.Temperature)
	if n.Kind == Rectangular {
		e.SlotReynolds = e.Density * e.Velocity * n.Height / mu
	}
	e.ConvectiveMach = e.Velocity / (e.SoundSpeed + e.AmbientSoundSpeed)
	if e.ShockContaining() && p.mj > 1 {
		beta := math.Sqrt(p.mj*p.mj - 1)
		dj := math.Sqrt(4 * p.mdot / (p.rho * p.uj * math.Pi))
		e.ShockCellSpacing = shockSpacingTam * beta * dj
		e.ShockCellSpacingUpper = shockSpacingPack * beta * dj
	}
	if p.designMach <= 1 && c.Primary.NPR >= machDiskNPR {
		e.MachDiskDistance = machDiskCoefficient * math.Sqrt(c.Primary.NPR) * math.Sqrt(4*n.ExitArea()/math.Pi)
	}
	return e, nil
}
