package acoustics

import (
	"fmt"
	"math"
	"strconv"
	"strings"
)

// CrestAllowance is the margin in dB by which a microphone's maximum sound
// pressure level should exceed the estimated level, to allow for the crest
// factor (peak/rms) of jet and crackle noise: 15 dB (acoustics.md §5.1,
// FROM MEMORY, medium confidence).
const CrestAllowance = 15.0

// MicrophoneClass is one nominal size of measurement microphone with the
// typical range of its limits. Typical values vary a lot with design, bias
// and polarization; the user's data sheets override them.
type MicrophoneClass struct {
	// Name is the nominal size, such as "1/4 in".
	Name string
	// Diameter is the nominal diaphragm diameter in m.
	Diameter float64
	// UpperFrequencyLow and UpperFrequencyHigh bound the typical free-field
	// upper frequency limit (about ±2 dB) in Hz.
	UpperFrequencyLow, UpperFrequencyHigh float64
	// MaxLevelLow and MaxLevelHigh bound the typical maximum sound pressure
	// level (about 3 % distortion) in dB re 20 µPa.
	MaxLevelLow, MaxLevelHigh float64
}

// MicrophoneClasses returns the typical-values table of acoustics.md §5.1
// (FROM MEMORY, medium confidence; to be replaced by the data sheets of the
// microphones actually used), from the largest size (lowest self-noise) to
// the smallest. The caller owns the returned slice.
func MicrophoneClasses() []MicrophoneClass {
	return []MicrophoneClass{
		{Name: "1 in", Diameter: 25.4e-3, UpperFrequencyLow: 8e3, UpperFrequencyHigh: 20e3, MaxLevelLow: 140, MaxLevelHigh: 146},
		{Name: "1/2 in", Diameter: 12.7e-3, UpperFrequencyLow: 20e3, UpperFrequencyHigh: 40e3, MaxLevelLow: 140, MaxLevelHigh: 160},
		{Name: "1/4 in", Diameter: 6.35e-3, UpperFrequencyLow: 70e3, UpperFrequencyHigh: 100e3, MaxLevelLow: 160, MaxLevelHigh: 175},
		{Name: "1/8 in", Diameter: 3.18e-3, UpperFrequencyLow: 100e3, UpperFrequencyHigh: 140e3, MaxLevelLow: 170, MaxLevelHigh: 180},
	}
}

// MicrophoneAdvice suggests a nominal microphone size, in words, for an
// estimated peak level peakLevel (dB re 20 µPa, for example
// [LevelEstimate.PeakLevel]) and highest frequency of interest fMax (Hz),
// from the table of [MicrophoneClasses]. See [AdviseMicrophone] for the
// rule. The table is FROM MEMORY; the advice says so and asks the user to
// check data sheets.
func MicrophoneAdvice(peakLevel, fMax float64) string {
	return AdviseMicrophone(MicrophoneClasses(), peakLevel, fMax)
}

// AdviseMicrophone suggests, in words, a microphone class from classes
// (ordered by preference, largest and quietest first) for an estimated peak
// level peakLevel (dB re 20 µPa) and highest frequency of interest fMax
// (Hz). A class fits when its maximum level is at least
// peakLevel + [CrestAllowance] dB and its upper frequency at least fMax
// (limits inclusive). The advice names the first class that fits at the top
// of its typical ranges. When that class fits only at the top, the advice
// says so and names the first class, if any, that fits at the bottom of its
// ranges as the alternative with margin. When no class fits, it says so.
// A fMax ≤ 0 sets no frequency requirement.
//
// Special cases are:
//
//	AdviseMicrophone(classes, NaN, fMax) and AdviseMicrophone(classes, L, NaN) say that no advice can be given
//	AdviseMicrophone(nil, L, fMax) says that no class fits
func AdviseMicrophone(classes []MicrophoneClass, peakLevel, fMax float64) string {
	switch {
	case math.IsNaN(peakLevel):
		return "No microphone advice: the peak level is not a number."
	case math.IsNaN(fMax):
		return "No microphone advice: the highest frequency is not a number."
	}
	need := peakLevel + CrestAllowance
	want := fmt.Sprintf("%.0f dB (estimated peak %.0f dB plus %.0f dB for the crest factor)",
		need, peakLevel, CrestAllowance)
	if fMax > 0 {
		want = frequencyWords(fMax) + " and " + want
	}
	const check = " Typical values from memory: check the data sheet of the microphone you use."
	fitsLow := func(c MicrophoneClass) bool { return c.UpperFrequencyLow >= fMax && c.MaxLevelLow >= need }
	fitsHigh := func(c MicrophoneClass) bool { return c.UpperFrequencyHigh >= fMax && c.MaxLevelHigh >= need }
	for i, c := range classes {
		if !fitsHigh(c) {
			continue
		}
		if fitsLow(c) {
			return fmt.Sprintf("Use a %s microphone: it must reach %s; typical %s limits are %s.%s",
				c.Name, want, c.Name, classLimits(c), check)
		}
		alt := ""
		for _, a := range classes[i+1:] {
			if fitsLow(a) {
				alt = fmt.Sprintf(" A %s microphone (typically %s) fits with margin but has more self-noise.", a.Name, classLimits(a))
				break
			}
		}
		return fmt.Sprintf("A %s microphone may do, at the top of its typical range: it must reach %s; typical %s limits are %s.%s%s",
			c.Name, want, c.Name, classLimits(c), alt, check)
	}
	return fmt.Sprintf("No microphone size in the table is expected to reach %s; split the band between sizes or choose from data sheets.%s",
		want, check)
}

// classLimits describes the typical ranges of c in words.
func classLimits(c MicrophoneClass) string {
	return fmt.Sprintf("%s to %s and %.0f to %.0f dB",
		frequencyWords(c.UpperFrequencyLow), frequencyWords(c.UpperFrequencyHigh), c.MaxLevelLow, c.MaxLevelHigh)
}

// frequencyWords formats a frequency in Hz with three significant figures,
// in kHz from 1 kHz up.
func frequencyWords(f float64) string {
	if math.Abs(f) >= 1e3 {
		return strconv.FormatFloat(f/1e3, 'g', 3, 64) + " kHz"
	}
	return strconv.FormatFloat(f, 'g', 3, 64) + " Hz"
}

// Microphone is the microphone a station uses: its nominal size and the
// limits that matter for the level check. The layout names one on an
// array or stand; limits it leaves out come from [MicrophoneClasses] at the
// cautious end of the typical range.
type Microphone struct {
	// Name is the nominal size ("1/4 in") or the user's label.
	Name string
	// Diameter is the diaphragm diameter, m; 0 if unknown.
	Diameter float64
	// MaxLevel is the upper level limit, dB re 20 µPa.
	MaxLevel float64
	// UpperFrequency is the upper frequency limit, Hz.
	UpperFrequency float64
}

// MicrophoneClassNamed returns the class of [MicrophoneClasses] whose
// nominal size is name, written "1/4 in", "1/4in", "1/4\"" or "1/4 inch"
// (and "1 in" or "1/2 in" likewise).
func MicrophoneClassNamed(name string) (MicrophoneClass, bool) {
	n := strings.ToLower(strings.TrimSpace(name))
	for _, suf := range []string{"inches", "inch", "in", "\"", "″"} {
		if strings.HasSuffix(n, suf) {
			n = strings.TrimSpace(strings.TrimSuffix(n, suf))
			break
		}
	}
	for _, c := range MicrophoneClasses() {
		if strings.TrimSuffix(c.Name, " in") == n {
			return c, true
		}
	}
	return MicrophoneClass{}, false
}

// Typical returns the microphone of class c at the cautious end of its
// typical ranges: the lower upper-frequency and maximum-level limits.
func (c MicrophoneClass) Typical() Microphone {
	return Microphone{Name: c.Name, Diameter: c.Diameter, MaxLevel: c.MaxLevelLow, UpperFrequency: c.UpperFrequencyLow}
}

// LevelMargin returns how far, in dB, the microphone's upper level limit
// lies above a predicted overall level oaspl (dB) plus [CrestAllowance]:
// negative when the microphone is expected to overload.
func (m Microphone) LevelMargin(oaspl float64) float64 {
	return m.MaxLevel - (oaspl + CrestAllowance)
}

// SmallestFit returns the class of [MicrophoneClasses], in their order from
// the largest diaphragm (least self-noise) down, that first fits a
// predicted overall level oaspl (dB) with [CrestAllowance] and a highest
// frequency fMax (Hz) at the cautious end of its typical ranges, that is
// the least small size that fits; ok is false when none does.
func SmallestFit(oaspl, fMax float64) (c MicrophoneClass, ok bool) {
	for _, c := range MicrophoneClasses() {
		if c.UpperFrequencyLow >= fMax && c.MaxLevelLow >= oaspl+CrestAllowance {
			return c, true
		}
	}
	return MicrophoneClass{}, false
}
