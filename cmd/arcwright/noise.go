package main

import (
	"errors"
	"fmt"
	"io"
	"math"
	"strconv"
	"strings"

	"github.com/spf13/cobra"
	"github.com/spf13/pflag"

	"arcwright/internal/acoustics"
	"arcwright/internal/export"
	"arcwright/internal/jet"
	"arcwright/internal/layout"
	"arcwright/internal/planner"
	"arcwright/internal/units"
)

// NoiseOptions are the noise command's inputs: the plume command's jet
// flags plus the receiver and the air.
type NoiseOptions struct {
	PlumeOptions
	Distance, Polar, Humidity float64
}

// AddFlags binds the options to fs.
func (o *NoiseOptions) AddFlags(fs *pflag.FlagSet) {
	jetFlags := pflag.NewFlagSet("jet", pflag.ContinueOnError)
	o.PlumeOptions.AddFlags(jetFlags)
	jetFlags.VisitAll(func(f *pflag.Flag) {
		switch f.Name {
		case "at", "format", "velocity-limit", "temperature-limit":
			return // the profile table, its formats and the zone limits are the plume command's
		}
		fs.AddFlag(f)
	})
	dist := newQuantity(units.Length, "", &o.Distance, "")
	dist.unitRequired = "the level goes with 20·log10 of the distance: metres and feet differ by 10 dB"
	dist.plausible = &layout.Range{What: "distance", Min: 0, Max: layout.MaxLength, MinOpen: true, Unit: "m", Show: layout.MetricLength}
	fs.Var(dist, "distance", "distance of the receiver from the centre of the nozzle exit, with its unit, e.g. 5.08m or 150ft")
	polar := newQuantity(units.Angle, "deg", &o.Polar, "90deg")
	polar.plausible = &layout.Range{What: "polar angle from the downstream jet axis", Min: 0, Max: math.Pi, Show: units.FormatAngleDeg}
	fs.Var(polar, "polar", "polar angle of the receiver from the downstream jet axis, even with a from_inlet layout, e.g. 30deg (a bare number is in degrees)")
	hum := newQuantity(units.Fraction, "%", &o.Humidity, "70%")
	hum.plausible = &layout.Range{What: "relative humidity", Min: 0, Max: 1, Show: func(v float64) string { return strconv.FormatFloat(100*v, 'g', 4, 64) + " %" }}
	fs.Var(&percentFlag{hum}, "humidity", "relative humidity of the air in percent, e.g. 70% (without a layout)")
	formatFlag(fs, &o.Format, "text", "json")
}

func newNoiseCommand(stdout, stderr io.Writer) *cobra.Command {
	o := &NoiseOptions{}
	c := &cobra.Command{
		Use:   "noise",
		Short: "Predict the jet-noise levels at one distance and angle",
		Long: `Predict the noise of one jet at one receiver: the 1/3-octave spectrum at the
exact base-ten band centres, the OASPL, the A-weighted level (IEC 61672-1) and
an estimate of the C-weighted peak, with the stated uncertainty.

The method is the SAE ARP 876 single-stream procedure for the mixing noise
(sound power, density exponent, directivity), spread over the similarity
spectra of Tam, Golebiowski & Seiner (1996), plus shock-associated noise after
Harper-Bourne & Fisher (1973) in the ARP 876 form for imperfectly expanded
jets. The sound spreads spherically from the end of the potential core, the
source position the planner uses, with ISO 9613-1 air absorption; this command
assumes a free field (the plan adds the floor and the room). Expect about
±3 dB on OASPL inside the tables' range, more near the jet axis, for
shock-containing jets and outside the tables.

Give the jet as for 'arcwright plume' (flags, or --layout and --point) and the
receiver with --distance and --polar. --distance is measured from the centre
of the nozzle exit and needs its unit (5.08m, 150ft): the level goes with
20·log10 of the distance, so a bare number read as metres where feet were
meant would be 10 dB off, whatever unit the layout uses. --polar is always
from the downstream jet axis (0° looks down the exhaust), even when the
layout counts its angles from the inlet (polar_angle: from_inlet; there
40° from the inlet is --polar 140); a bare number is in degrees.

A coaxial jet is not predicted as its fully mixed equivalent alone (a lower
bound for separate-flow jets) but, band by band, as the larger of the mixed
jet and the energy sum of its two streams each predicted alone, radiating
from the end of either the mixed jet's or the primary stream's own potential
core, whichever is louder; the four-source model of Fisher, Preston & Bryce
(1998) is not implemented, and the stated uncertainty is 3 dB wider.

A receiver on the nozzle (within one nozzle diameter of the exit centre),
inside the jet's conservative velocity or hot zone (the outline the planner
keeps stations out of) or within 2 Dj of the noise source is refused as a
command-line error; one nearer than the acoustic far field (50 Dj from the
source) is predicted with a warning on standard error.

Examples:
  arcwright noise --diameter 50.8mm --npr 1.69 --temperature-ratio 1 --distance 5.08m --polar 30deg
  arcwright noise --layout layouts/outdoor-static-pad.yaml --point P-185 --distance 150ft --polar 140 --format json

The levels are estimates. Hearing protection and exclusion zones follow the
facility's procedures, local codes and licensed practice.

Exit status: 0 on success, 1 on bad input, 2 on a bad command line.`,
		Args: noArgs,
		RunE: func(cmd *cobra.Command, args []string) error {
			return runNoise(o, cmd.Flags(), stdout, stderr)
		},
	}
	o.AddFlags(c.Flags())
	return c
}

// extrapolatedWords follow the note of a jet outside the ARP 876 tables.
const extrapolatedWords = "The levels are extrapolated beyond the model's data; the stated uncertainty is widened for it, and is itself a guess there."

// noiseCaution is printed under every text prediction.
const noiseCaution = "The levels are estimates with the stated uncertainty. Hearing protection and exclusion zones follow the facility's procedures, local codes and licensed practice."

func runNoise(o *NoiseOptions, fs *pflag.FlagSet, w, stderr io.Writer) error {
	if !fs.Changed("distance") {
		return usageError{errors.New("--distance is required: the receiver's distance from the nozzle exit, e.g. --distance 5.08m")}
	}
	if o.Layout != "" && fs.Changed("humidity") {
		return usageError{errors.New("--humidity would be ignored: with --layout the air comes from the layout")}
	}
	if !(o.Distance > 0) || math.IsInf(o.Distance, 0) {
		return fmt.Errorf("--distance: want a distance above 0, got %s", units.FormatLength(o.Distance, units.Metric))
	}
	if !(o.Polar >= 0 && o.Polar <= math.Pi) {
		return fmt.Errorf("--polar: want 0–180° from the downstream jet axis, got %s", units.FormatAngleDeg(o.Polar))
	}
	n, c, lim, sys, err := plumeInputs(&o.PlumeOptions, fs)
	if err != nil {
		return err
	}
	if o.Units == "imperial" {
		sys = units.Imperial
	} else if o.Units == "metric" {
		sys = units.Metric
	}
	atm := acoustics.Atmosphere{Temperature: c.Ambient.Temperature, RelativeHumidity: 100 * o.Humidity, Pressure: c.Ambient.Pressure}
	if o.Layout != "" {
		req, _, err := layout.Load(o.Layout)
		if err != nil {
			return err
		}
		atm.RelativeHumidity = req.Ambient.Humidity
	}
	if err := atm.Validate(); err != nil {
		return fmt.Errorf("air: %w", err)
	}
	p, err := jet.NewPlume(n, c, lim)
	if err != nil {
		var ie *jet.InputError
		if o.Layout == "" && errors.As(err, &ie) {
			if f, ok := flagOf[ie.Field]; ok {
				return fmt.Errorf("%s: %s %s", f, ie.Field, ie.Reason)
			}
		}
		return err
	}
	src, xss, err := planner.JetNoiseSource(p, atm)
	if err != nil {
		return err
	}
	if err := receiverOutsideJet(o, p, xss, sys); err != nil {
		return err
	}
	// the louder of the candidate source positions (two for a coaxial jet)
	bands := src.Bands()
	var best struct {
		l         acoustics.Levels
		levels    []float64
		r, th, xs float64
	}
	for i, xs := range xss {
		r, th, _ := acoustics.SourceOffset(o.Distance, o.Polar, xs)
		th = math.Abs(th)
		levels := make([]float64, len(bands))
		l, err := src.At(acoustics.Path{Distance: r, Polar: th}, levels)
		if err != nil {
			return err
		}
		if i == 0 || l.OASPL > best.l.OASPL {
			best.l, best.levels, best.r, best.th, best.xs = l, levels, r, th, xs
		}
	}
	farField := planner.DefaultLimits().FarFieldRatio
	var near string
	if ratio := best.r / p.Exit().FullyExpandedDiameter; ratio < farField {
		near = fmt.Sprintf("the receiver is %.3g Dj from the source, short of the %.0f Dj of the acoustic far field (common practice): the prediction is a far-field one and near-field levels differ.", ratio, farField)
		fmt.Fprintln(stderr, "arcwright: warning: "+near)
	}
	// a jet outside the ARP 876 tables: the levels are extrapolated (the
	// stated uncertainty includes the source's widening for it)
	var notes []string
	if e := p.Exit(); !src.Coaxial() && !acoustics.ARP876InRange(e.Velocity, atm.SpeedOfSound()) {
		for _, n := range src.Notes() {
			if strings.HasPrefix(n, "Uj/c0") {
				n += " " + extrapolatedWords
				notes = append(notes, n)
				fmt.Fprintln(stderr, "arcwright: warning: "+n)
			}
		}
	}
	if o.Format == "json" {
		if near != "" {
			notes = append(notes, near)
		}
		return export.NoiseJSON(w, best.l, src.Method(), bands, best.levels, notes...)
	}
	return noiseText(w, src, p, best.l, best.levels, best.r, best.th, best.xs, near, o, atm, sys)
}

// receiverOutsideJet returns a command-line error naming --distance and
// --polar when the receiver is within one nozzle diameter of the exit
// centre (the nozzle itself), on or inside the conservative velocity or hot
// zone of plume p (the outline the planner keeps stations out of, without
// the layout's margin), or within acoustics.MinSourceDistance Dj of a source position in
// xss (m downstream of the exit).
func receiverOutsideJet(o *NoiseOptions, p *jet.Plume, xss []float64, sys units.System) error {
	L := func(m float64) string { return units.FormatLength(m, sys) }
	at := fmt.Sprintf("--distance %s at --polar %s puts the receiver", L(o.Distance), units.FormatAngleDeg(o.Polar))
	d := p.Exit().Diameter
	if o.Distance < d {
		return usageError{fmt.Errorf("%s within one nozzle diameter (%s) of the centre of the nozzle exit, on the nozzle: give a receiver outside the jet and clear of the nozzle", at, L(d))}
	}
	x, r := o.Distance*math.Cos(o.Polar), o.Distance*math.Sin(o.Polar)
	for _, z := range []struct {
		name string
		zone jet.Zone
	}{{"velocity zone", jet.VelocityZone}, {"hot zone", jet.HotZone}} {
		env := p.Envelope(z.zone, jet.Conservative)
		if env.Length > 0 && env.Clearance(x, r) <= 0 {
			return usageError{fmt.Errorf("%s inside the jet's conservative %s (it reaches %s downstream; the outline the planner keeps stations out of): the prediction is a far-field one; give a receiver outside the jet", at, z.name, L(env.Length))}
		}
	}
	dj := p.Exit().FullyExpandedDiameter
	for _, xs := range xss {
		if math.Hypot(x-xs, r) < acoustics.MinSourceDistance*dj {
			return usageError{fmt.Errorf("%s within %g Dj (%s) of the noise source at the end of the potential core, %s downstream: the prediction is a far-field one; give a receiver farther out", at, acoustics.MinSourceDistance, L(acoustics.MinSourceDistance*dj), L(xs))}
		}
	}
	return nil
}

func noiseText(w io.Writer, src *acoustics.NoiseSource, p *jet.Plume, l acoustics.Levels, levels []float64, r, th, xs float64, near string, o *NoiseOptions, atm acoustics.Atmosphere, sys units.System) error {
	e := p.Exit()
	L := func(m float64) string { return units.FormatLength(m, sys) }
	fmt.Fprintf(w, "%s nozzle, D %s, Uj %s (Uj/c0 %.2f), Tt %s; air %s, %.0f %% RH, %s\n",
		p.Nozzle().Kind, L(e.Diameter), units.FormatVelocity(e.Velocity, sys), e.Velocity/atm.SpeedOfSound(),
		units.FormatTemperature(e.TotalTemperature, sys), units.FormatTemperature(atm.Temperature, sys), atm.RelativeHumidity, units.FormatPressure(atm.Pressure, sys))
	fmt.Fprintf(w, "Receiver %s from the nozzle exit at %s from the downstream jet axis;\n", L(o.Distance), units.FormatAngleDeg(o.Polar))
	core := "the potential core"
	if xs != p.CoreLength(jet.Nominal) {
		core = "the primary stream's own potential core"
	}
	fmt.Fprintf(w, "  %s from the source at the end of %s (%s downstream), at %s.\n\n", L(r), core, L(xs), units.FormatAngleDeg(th))
	total, mixing := src.SoundPower()
	tw := newTable(w, 0)
	fmt.Fprintf(tw, "OASPL\t%.1f dB\t± %.0f dB\n", l.OASPL, l.Uncertainty)
	fmt.Fprintf(tw, "A-weighted\t%.1f dB(A)\tIEC 61672-1\n", l.AWeighted)
	fmt.Fprintf(tw, "C-weighted peak\t%.1f dB(C)\testimate: C-weighted level %.1f dB + %.0f dB crest factor\n", l.Peak, l.CWeighted, src.CrestFactor())
	fmt.Fprintf(tw, "Sound power\t%.1f dB re 1 pW\tmixing noise %.1f dB\n", 10*math.Log10(total/acoustics.ReferenceSoundPower), 10*math.Log10(mixing/acoustics.ReferenceSoundPower))
	tw.Flush()
	fmt.Fprintf(w, "\nMethod: %s.\n", src.Method())
	fmt.Fprintln(w, "\n1/3-octave spectrum (free field, with air absorption)")
	tw = newTable(w, 0)
	fmt.Fprintln(tw, "  band\tcentre, Hz\tdB\tdB(A)\t")
	bands := src.Bands()
	loudest := math.Inf(-1)
	for _, v := range levels {
		loudest = math.Max(loudest, v)
	}
	fTop := 0.0
	for i, b := range bands {
		if levels[i] >= loudest-20 {
			fTop = b.Upper
		}
		fmt.Fprintf(tw, "  %s\t%s\t%.1f\t%.1f\t\n", b.Nominal, strconv.FormatFloat(b.Centre, 'g', 6, 64), levels[i], levels[i]+acoustics.AWeighting(b.Centre))
	}
	tw.Flush()
	fmt.Fprintln(w, "\nMicrophone: "+acoustics.MicrophoneAdvice(l.OASPL, fTop))
	notes := src.Notes()
	for i, n := range notes {
		if strings.HasPrefix(n, "Uj/c0") && !src.Coaxial() {
			notes[i] = n + " " + extrapolatedWords
		}
	}
	if near != "" {
		notes = append(notes, near)
	}
	if len(notes) > 0 {
		fmt.Fprintln(w, "\nNotes")
		for _, n := range notes {
			fmt.Fprintln(w, "  - "+strings.ToUpper(n[:1])+n[1:])
		}
	}
	fmt.Fprintln(w, "\n"+noiseCaution)
	return nil
}
