package jet

import (
	"fmt"
	"math"
)

// FlagKind is the kind of a regime flag.
type FlagKind int

// Flag kinds.
const (
	FlagLaminar    FlagKind = iota + 1 // below the transition Reynolds number
	FlagBuoyant                        // bent by buoyancy within its zones
	FlagShock                          // carries shock cells or a Mach disk
	FlagOutsideFit                     // an input outside a correlation's fitted range
	FlagGeometry                       // a simplification of the nozzle geometry
)

func (k FlagKind) String() string {
	switch k {
	case FlagLaminar:
		return "laminar"
	case FlagBuoyant:
		return "buoyant"
	case FlagShock:
		return "shock-containing"
	case FlagOutsideFit:
		return "outside fitted range"
	case FlagGeometry:
		return "geometry"
	}
	return fmt.Sprintf("FlagKind(%d)", int(k))
}

// Flag is one regime flag with its reason in words.
type Flag struct {
	Kind   FlagKind
	Reason string
}

func (f Flag) String() string { return f.Kind.String() + ": " + f.Reason }

// Has reports whether flags holds a flag of kind k.
func Has(flags []Flag, k FlagKind) bool {
	for _, f := range flags {
		if f.Kind == k {
			return true
		}
	}
	return false
}

func (p *Plume) regimeFlags() []Flag {
	var fl []Flag
	add := func(k FlagKind, format string, a ...any) {
		fl = append(fl, Flag{Kind: k, Reason: fmt.Sprintf(format, a...)})
	}
	e := p.exit
	n := p.nozzle
	switch {
	case p.nom.laminar:
		add(FlagLaminar, "Reynolds number %.0f (Uj·D_eff/ν of the ambient air) is below about 2,000 (common practice): the laminar Schlichting (1933) solution is used; the conservative zones also cover a turbulent jet", e.AmbientReynolds)
	case e.AmbientReynolds < laminarUpperRe:
		add(FlagOutsideFit, "Reynolds number %.0f (Uj·D_eff/ν of the ambient air) is in the transition band up to about 4,000: the jet may still be laminar, and the conservative zones hold the laminar Schlichting (1933) zones as well", e.AmbientReynolds)
	case e.Reynolds < fittedRe:
		add(FlagOutsideFit, "Reynolds number %.0f is below the ~10,000 of the turbulent decay data: real decay is faster (Abdel-Rahman et al. 1996), so the zones are over-estimated", e.Reynolds)
	}
	if n.Kind == Rectangular && e.SlotReynolds < laminarPlaneRe {
		add(FlagLaminar, "slot Reynolds number %.1f is below about 30 (Andrade 1939, from memory): the plane laminar Bickley (1937) decay is used near the exit", e.SlotReynolds)
	}
	if !p.nom.laminar && (e.Mach < lauMachMin || e.Mach > lauMachMax) {
		add(FlagOutsideFit, "fully expanded Mach number %.2f is outside the %.2f–%.2f of Lau's core-length data: the core length is extrapolated (the conservative zone keeps at least %.0f Dj)", e.Mach, lauMachMin, lauMachMax, p.cons.m.CoreMin)
	}
	if e.DensityRatio < densityRatioMin || e.DensityRatio > densityRatioMax {
		add(FlagOutsideFit, "jet-to-ambient density ratio %.2f is outside 1/4–4, where the Thring–Newby effective diameter collapses decay data", e.DensityRatio)
	}
	switch e.Expansion {
	case UnderExpanded, OverExpanded:
		msg := fmt.Sprintf("%s jet (exit pressure %.0f Pa, ambient %.0f Pa)", e.Expansion, e.ExitPressure, p.cond.Ambient.Pressure)
		if e.ShockCellSpacing > 0 {
			msg += fmt.Sprintf(": shock cells about %.3g m apart (%.3g m vortex-sheet value), expect screech and broadband shock-associated noise", e.ShockCellSpacing, e.ShockCellSpacingUpper)
		}
		add(FlagShock, "%s", msg)
	case ShockInNozzle:
		add(FlagShock, "a normal shock stands inside the nozzle at NPR %.3g: the fully expanded state ignores its total-pressure loss, so velocity and zones are over-stated", p.cond.Primary.NPR)
	}
	if e.MachDiskDistance > 0 {
		add(FlagShock, "NPR %.3g is high enough for a Mach disk, about %.3g m from the exit (Crist, Sherman & Glass 1966)", p.cond.Primary.NPR, e.MachDiskDistance)
	}
	// buoyancy over the zone of interest: the longer conservative zone
	zone := math.Max(p.env[0][1].Length, p.env[1][1].Length)
	if b := p.buoy; zone > b.Onset {
		dir := "up"
		if b.ReducedGravity < 0 {
			dir = "down"
		}
		add(FlagBuoyant, "the %.3g m zone reaches beyond %.3g m, where buoyancy starts to bend the jet %s (x_b = 0.53, Chen & Rodi 1980; momentum length %.3g m); the stations are checked against the zones both about the straight axis and about the bent path of an integral model (wider scatter, about ±30 %% in rise)", zone, b.Onset, dir, b.MomentumLength)
	}
	switch n.Kind {
	case Rectangular:
		add(FlagGeometry, "rectangular exit (aspect ratio %.3g): the zones are drawn round about the axis, circumscribing the section from its corners, on the area-equivalent diameter %.3g m", n.AspectRatio(), e.Diameter)
		if ar := n.AspectRatio(); ar > 1 && ar < planeAspectMin {
			add(FlagOutsideFit, "aspect ratio %.3g is below the ~20 needed for a plane-jet region (Deo, Mi & Nathan 2007): the round-jet law is used", ar)
		}
	case Coaxial:
		add(FlagGeometry, "coaxial exit: the two streams are replaced by one mixed jet of the same mass flow, momentum and energy; the near-field zone is drawn from the outer lip")
	}
	if p.env[0][0].Length == 0 {
		add(FlagOutsideFit, "the jet is not faster than the velocity limit %.3g m/s: there is no velocity zone", p.limits.Velocity)
	}
	return fl
}
