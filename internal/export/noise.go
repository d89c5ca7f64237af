package export

import (
	"encoding/json"
	"fmt"
	"io"

	"arcwright/internal/acoustics"
)

// noiseDoc is the noise command's JSON document. Field order is key order.
type noiseDoc struct {
	OASPL       num            `json:"oaspl_db"`
	AWeighted   num            `json:"a_weighted_db"`
	Peak        num            `json:"peak_db"`
	Uncertainty num            `json:"uncertainty_db"`
	Method      string         `json:"method"`
	Spectrum    []noiseBandDoc `json:"spectrum"`
	// Notes say where the prediction is weaker than its method's range
	// (a jet outside the tables, say); left out when there is none.
	Notes []string `json:"notes,omitempty"`
}

type noiseBandDoc struct {
	Frequency num `json:"frequency_hz"`
	Level     num `json:"db"`
}

// levelDecimals is the rounding of levels in dB: 0.01 dB.
const levelDecimals = 2

// NoiseJSON writes the noise command's prediction: the levels l at one
// receiver by the method named method (the source's
// [acoustics.NoiseSource.Method]) and the band levels (dB) at the exact
// midbands of bands, with the notes (left out when none). It
// returns an error when a level is not finite or the lengths differ.
func NoiseJSON(w io.Writer, l acoustics.Levels, method string, bands []acoustics.Band, levels []float64, notes ...string) error {
	if len(bands) != len(levels) {
		return fmt.Errorf("export: %d bands but %d band levels", len(bands), len(levels))
	}
	for _, v := range []float64{l.OASPL, l.AWeighted, l.Peak, l.Uncertainty} {
		if !finite(v) {
			return fmt.Errorf("export: a predicted level is not finite: %+v", l)
		}
	}
	d := noiseDoc{
		OASPL:       num(roundTo(l.OASPL, levelDecimals)),
		AWeighted:   num(roundTo(l.AWeighted, levelDecimals)),
		Peak:        num(roundTo(l.Peak, levelDecimals)),
		Uncertainty: num(l.Uncertainty),
		Method:      method,
		Spectrum:    make([]noiseBandDoc, len(bands)),
		Notes:       notes,
	}
	for i, b := range bands {
		d.Spectrum[i] = noiseBandDoc{Frequency: num(b.Centre), Level: num(roundTo(levels[i], levelDecimals))}
	}
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	enc.SetEscapeHTML(false)
	return enc.Encode(d)
}
