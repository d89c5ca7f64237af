package planner

import (
	"fmt"
	"math"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/acoustics"
	"arcwright/internal/geometry"
)

// Contour levels the sheet always draws: the EU upper exposure action
// value 85 dB(A) and the limit value 140 dB(C) peak (EU 2003/10/EC,
// CONFIRMED, acoustics.md §7.1).
const (
	ContourA    = acoustics.EUUpperActionA
	ContourPeak = acoustics.EULimitPeak
)

// noiseMapNodes is the number of grid nodes along the longer side of the
// noise map (a project choice: fine enough for a sheet, cheap to compute).
const noiseMapNodes = 61

// NoiseContour is one level's contour on the plan.
type NoiseContour struct {
	// Peak is true for a C-weighted peak contour, false for dB(A).
	Peak  bool
	Level float64 // dB(A) or dB(C) peak
	Lines []orb.LineString
	// Everywhere is true when the whole map is at or above the level (and
	// Lines is empty).
	Everywhere bool
}

// Label returns "85 dB(A)" or "140 dB(C) peak".
func (c NoiseContour) Label() string {
	if c.Peak {
		return fmt.Sprintf("%g dB(C) peak", c.Level)
	}
	return fmt.Sprintf("%g dB(A)", c.Level)
}

// NoiseMap is the predicted noise on the plan at ear height for the
// loudest operating point.
type NoiseMap struct {
	Point    string  // the operating point with the largest sound power
	Height   float64 // height of the map above the floor, m
	Bounds   orb.Bound
	Contours []NoiseContour // 85 dB(A), the layout's dB(A) levels, 140 dB(C) peak
}

// NoiseMap predicts the A-weighted level and the C-weighted peak on a grid
// over the cell (or, for an unbounded pad, over the stations, crew and
// exit with a margin) at [DefaultEarHeight] for the operating point with
// the largest sound power, and returns the contours of 85 dB(A), the
// layout's noise.contours and 140 dB(C) peak. It is computed on demand (for
// the sheet and GeoJSON), not by [New].
func (p *Plan) NoiseMap() (*NoiseMap, error) {
	req := p.Request
	if req == nil || len(p.Points) == 0 {
		return nil, fmt.Errorf("%w: no plan to map", ErrRequest)
	}
	atm := acoustics.Atmosphere{Temperature: req.Ambient.Temperature, RelativeHumidity: req.Ambient.Humidity, Pressure: req.Ambient.Pressure}
	nm, err := newNoiseModel(req, p.Points, atm)
	if err != nil {
		return nil, err
	}
	ck := &checker{req: req, points: p.Points, noise: nm}
	loud, best := 0, math.Inf(-1)
	for k, s := range nm.sources {
		if w, _ := s.SoundPower(); w > best {
			loud, best = k, w
		}
	}
	b := mapBounds(p)
	w, h := b.Max[0]-b.Min[0], b.Max[1]-b.Min[1]
	step := math.Max(w, h) / (noiseMapNodes - 1)
	if !(step > 0) {
		return nil, fmt.Errorf("%w: the plan has no extent to map", ErrRequest)
	}
	nx, ny := int(math.Ceil(w/step))+1, int(math.Ceil(h/step))+1
	z := DefaultEarHeight
	if c := req.Cell.Ceiling; c < z {
		z = c / 2
	}
	ga := geometry.Grid{X0: b.Min[0], Y0: b.Min[1], Step: step, NX: nx, NY: ny, Values: make([]float64, nx*ny)}
	gp := ga
	gp.Values = make([]float64, nx*ny)
	for j := 0; j < ny; j++ {
		for i := 0; i < nx; i++ {
			at := r3.Vec{X: b.Min[0] + float64(i)*step, Y: b.Min[1] + float64(j)*step, Z: z}
			l, err := ck.levelAt(loud, at)
			if err != nil {
				ga.Values[j*nx+i], gp.Values[j*nx+i] = math.NaN(), math.NaN()
				continue
			}
			ga.Values[j*nx+i], gp.Values[j*nx+i] = l.AWeighted, l.Peak
		}
	}
	m := &NoiseMap{Point: p.Points[loud].Name, Height: z, Bounds: orb.Bound{Min: b.Min, Max: orb.Point{b.Min[0] + float64(nx-1)*step, b.Min[1] + float64(ny-1)*step}}}
	levels := append([]float64{ContourA}, req.Noise.Contours...)
	for _, l := range levels {
		m.Contours = append(m.Contours, contourOf(ga, l, false))
	}
	m.Contours = append(m.Contours, contourOf(gp, ContourPeak, true))
	return m, nil
}

// contourOf returns the contour of level on g.
func contourOf(g geometry.Grid, level float64, peak bool) NoiseContour {
	c := NoiseContour{Peak: peak, Level: level, Lines: g.Contours(level)}
	if len(c.Lines) == 0 {
		c.Everywhere = true
		for _, v := range g.Values {
			if !(v >= level) && !math.IsNaN(v) {
				c.Everywhere = false
				break
			}
		}
	}
	return c
}

// mapBounds returns the plan area of the noise map: the cell's boundary,
// or the stations, crew and exit with a 20 % margin.
func mapBounds(p *Plan) orb.Bound {
	req := p.Request
	if req.Cell.Bounded() {
		return req.Cell.Boundary.Bound()
	}
	ex := req.Exit.Exit
	b := orb.Bound{Min: orb.Point{ex.X, ex.Y}, Max: orb.Point{ex.X, ex.Y}}
	for _, s := range p.Stations {
		b = b.Extend(orb.Point{s.Mic.X, s.Mic.Y})
	}
	for _, c := range req.Crew {
		b = b.Extend(orb.Point{c.At.X, c.At.Y})
	}
	pad := 0.2 * math.Max(math.Max(b.Max[0]-b.Min[0], b.Max[1]-b.Min[1]), 1)
	return b.Pad(pad)
}
