package planner

import (
	"arcwright/internal/acoustics"
	"arcwright/internal/jet"
)

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
