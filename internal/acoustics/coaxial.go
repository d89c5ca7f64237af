package acoustics

import (
	"fmt"
	"math"
)

// CoaxialMethod is added to [NoiseMethod] for a coaxial jet: how
// [NewCoaxialSource] bounds it.
const CoaxialMethod = "coaxial jet: band by band and angle by angle the larger of the fully mixed jet " +
	"and the energy sum of the primary and secondary streams each predicted as a single stream " +
	"(a conservative bound; the four-source model of Fisher, Preston & Bryce 1998 is not implemented)"

// coaxialUncertainty is added to the stated uncertainty of a coaxial jet,
// dB: this project's SUGGESTION, as large as the base ±3 dB, because
// neither bound is a published coaxial method and the two differ by up to
// 10 dB where a hot fast core sits in a slow cold annulus.
const coaxialUncertainty = 3.0

// coaxialPart is one of the predictions a coaxial source bounds.
type coaxialPart struct {
	name string // "mixed jet", "primary stream", "secondary stream"
	src  *NoiseSource
}

// NewCoaxialSource predicts the noise of a coaxial jet in atmosphere atm
// over bands (use NoiseBands(mixed, primary, secondary)) from three
// single-stream predictions:
//
//   - mixed, the fully mixed jet of the same mass flow, momentum and
//     enthalpy: a lower bound, because the streams' shear layers radiate
//     before they have mixed and mixing quietens a jet (common practice:
//     forced mixers);
//   - primary and secondary, each stream leaving alone into still air
//     from its own exit (the annulus as a round exit of its area): their
//     energy sum bounds the streams' own noise from above, because in the
//     coaxial jet the primary's shear layer sees the slower co-flowing
//     secondary, not still air (Lighthill's U⁸ scaling on the velocity
//     difference, FROM MEMORY).
//
// The level in every band at every angle is the larger of the mixed jet's
// and the energy sum of the two streams'; so it is never below either
// stream alone, and it tends to the single-stream prediction as the
// secondary stream vanishes. The published refinement, the four-source
// model of Fisher, Preston & Bryce (1998, FROM MEMORY), is not
// implemented. All three radiate from the one source position the caller
// uses. The stated uncertainty is the largest of the three plus 3 dB, the
// crest factor the largest. It returns an error when a jet or atm is
// invalid or bands is empty.
func NewCoaxialSource(mixed, primary, secondary Jet, atm Atmosphere, bands []Band) (*NoiseSource, error) {
	var parts []coaxialPart
	for _, p := range []struct {
		name string
		j    Jet
	}{{"mixed jet", mixed}, {"primary stream", primary}, {"secondary stream", secondary}} {
		src, err := NewNoiseSource(p.j, atm, bands)
		if err != nil {
			return nil, fmt.Errorf("%s: %w", p.name, err)
		}
		parts = append(parts, coaxialPart{p.name, src})
	}
	m, pr, se := parts[0].src, parts[1].src, parts[2].src
	s := *m // the mixed jet's atmosphere, bands, absorption and weightings
	s.parts = parts
	n := len(bands)
	cells := make([]float64, (angleSteps+1)*n)
	for k := 0; k <= angleSteps; k++ {
		row := cells[k*n : (k+1)*n : (k+1)*n]
		for b := range row {
			row[b] = math.Max(m.grid[k][b], pr.grid[k][b]+se.grid[k][b])
		}
		s.grid[k] = row
	}
	s.integratePower()
	s.mixingW = math.Max(m.mixingW, pr.mixingW+se.mixingW)
	s.inRange = m.inRange && pr.inRange && se.inRange
	for _, p := range parts {
		s.crest = math.Max(s.crest, p.src.crest)
		if p.src.beta > s.beta {
			s.beta, s.shockPeak = p.src.beta, p.src.shockPeak
		}
	}
	return &s, nil
}

// Coaxial reports whether s is the bound of a coaxial jet.
func (s *NoiseSource) Coaxial() bool { return s.parts != nil }

// Method returns the name of the prediction method of s, for outputs:
// [NoiseMethod], and for a coaxial jet [CoaxialMethod] too.
func (s *NoiseSource) Method() string {
	if s.parts != nil {
		return NoiseMethod + "; " + CoaxialMethod
	}
	return NoiseMethod
}

// coaxialUncertainty returns the stated uncertainty of a coaxial source at
// thetaJ (rad from the downstream jet axis): the largest of its parts' plus
// coaxialUncertainty.
func (s *NoiseSource) coaxialUncertainty(thetaJ float64) float64 {
	u := 0.0
	for _, p := range s.parts {
		u = math.Max(u, p.src.Uncertainty(thetaJ))
	}
	return u + coaxialUncertainty
}

// coaxialNotes returns the note on the coaxial bound, then the notes of
// its parts, each naming its part.
func (s *NoiseSource) coaxialNotes() []string {
	n := []string{fmt.Sprintf("coaxial jet: the levels are, band by band, the larger of the fully mixed jet "+
		"(a lower bound for separate-flow jets) and the energy sum of the primary and secondary streams each "+
		"predicted alone (an upper bound for their own noise); the four-source model of Fisher, Preston & Bryce "+
		"(1998) is not implemented; ±%.0f dB more uncertainty.", coaxialUncertainty)}
	for _, p := range s.parts {
		for _, m := range p.src.Notes() {
			n = append(n, p.name+": "+m)
		}
	}
	return n
}
