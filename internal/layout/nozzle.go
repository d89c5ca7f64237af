package layout

import (
	"errors"
	"fmt"
	"strings"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
)

var (
	nozzleKeys = []string{"exit", "axis_height", "heading", "kind", "contour", "diameter", "design_mach", "long_side", "short_side", "aspect_ratio", "secondary_diameter"}

	nozzleContours     = map[string]jet.Contour{"nozzle": jet.Contoured, "pipe": jet.Pipe}
	nozzleContourNames = []string{"nozzle", "pipe"}

	nozzleKinds = map[string]jet.Kind{
		"convergent":           jet.Convergent,
		"convergent-divergent": jet.ConvergentDivergent,
		"rectangular":          jet.Rectangular,
		"coaxial":              jet.Coaxial,
	}
	nozzleKindNames = []string{"convergent", "convergent-divergent", "rectangular", "coaxial"}

	// nozzleKeyKinds lists, for each key that only some kinds use, the
	// kinds that use it.
	nozzleKeyKinds = map[string][]jet.Kind{
		"design_mach":        {jet.ConvergentDivergent, jet.Rectangular},
		"long_side":          {jet.Rectangular},
		"short_side":         {jet.Rectangular},
		"aspect_ratio":       {jet.Rectangular},
		"secondary_diameter": {jet.Coaxial},
	}
)

// nozzleInfo is the decoded nozzle and what later checks may rely on.
type nozzleInfo struct {
	nozzle    jet.Nozzle
	frame     geometry.JetFrame
	kindOK    bool // nozzle.Kind is the layout's kind
	nozzleOK  bool // every dimension of nozzle is valid
	frameOK   bool // frame is valid
	headingOK bool // frame.Heading is the layout's heading
}

// outerRadius returns the largest distance of the exit rim from the exit
// centre that matters for clearances, m: half the diameter, half the
// secondary diameter of a coaxial nozzle, half the long side of a
// rectangular one.
func (ni *nozzleInfo) outerRadius() float64 {
	switch ni.nozzle.Kind {
	case jet.Rectangular:
		return ni.nozzle.Width / 2
	case jet.Coaxial:
		return ni.nozzle.SecondaryDiameter / 2
	}
	return ni.nozzle.Diameter / 2
}

// nozzleSection decodes the nozzle's place (exit, axis height, heading) and
// its exit geometry, and checks the exit against the cell.
func (d *decoder) nozzleSection(top *section, ci *cellInfo) *nozzleInfo {
	s := top.needSub("nozzle", "the nozzle (exit, axis_height, kind, diameter, …)", nozzleKeys)
	ni := &nozzleInfo{}
	var (
		exit             = r3.Vec{}
		okExit, okHeight bool
	)
	if n := s.need("exit", "the centre of the exit in plan, [x, y]"); n != nil {
		p, ok := d.planPoint(n, s.field("exit"), s.keyLine("exit"))
		exit.X, exit.Y, okExit = p[0], p[1], ok
	}
	if n := s.need("axis_height", "the height of the jet axis above the floor, a length such as 1.5 m"); n != nil {
		if exit.Z, okHeight = d.positiveLength(n, s.field("axis_height"), "the axis height"); okHeight {
			okHeight = d.heightRange(ci, exit.Z, n.Line, s.field("axis_height"), "the jet axis")
		}
	}
	ni.headingOK = true
	if n := s.get("heading"); n != nil {
		ni.frame.Heading, ni.headingOK = d.angle(n, s.field("heading"))
	}
	ni.frame.Exit = exit
	if okExit && okHeight && ni.headingOK {
		if err := ni.frame.Validate(); err != nil {
			d.add(ErrInvalid, err, s.line, s.path, err.Error())
		} else {
			ni.frameOK = true
		}
	}
	d.nozzleShape(s, ni)
	if ni.frameOK {
		d.exitPlace(s, ci, ni)
	}
	return ni
}

// nozzleShape decodes the kind and the dimensions of the exit.
func (d *decoder) nozzleShape(s *section, ni *nozzleInfo) {
	n := s.need("kind", "the nozzle kind: "+oneOf(nozzleKindNames))
	if n != nil {
		if k, ok := d.choice(n, s.field("kind"), nozzleKindNames); ok {
			ni.nozzle.Kind, ni.kindOK = nozzleKinds[k], true
		}
	}
	ok := ni.kindOK
	contour := jet.Contoured
	if n := s.get("contour"); n != nil {
		if c, good := d.choice(n, s.field("contour"), nozzleContourNames); good {
			contour = nozzleContours[c]
		} else {
			ok = false
		}
	}
	for _, key := range nozzleKeys {
		kinds, limited := nozzleKeyKinds[key]
		if limited && ni.kindOK && s.has(key) && !containsKind(kinds, ni.nozzle.Kind) {
			// Reported, but the key is not read, so the dimensions are still checked.
			d.errorf(ErrInvalid, s.keyLine(key), s.field(key), "applies only to %s nozzles, not %s", kindList(kinds), ni.nozzle.Kind)
		}
	}
	dim := func(key, what string, required bool) float64 {
		n := s.get(key)
		if n == nil {
			if required && ni.kindOK {
				s.need(key, what+", a length")
				ok = false
			}
			return 0
		}
		v, good := d.positiveLength(n, s.field(key), what)
		if good {
			r := NozzleSizeRange
			r.What = strings.TrimPrefix(what, "the ")
			good = d.checkRange(n.Line, s.field(key), r, v, d.fmtShort(v))
		}
		ok = ok && good
		return v
	}
	nz := &ni.nozzle
	switch nz.Kind {
	case jet.Rectangular:
		switch sides, aspect := s.has("long_side") || s.has("short_side"), s.has("diameter") || s.has("aspect_ratio"); {
		case sides && aspect:
			d.errorf(ErrInvalid, s.line, s.path, "give long_side and short_side, or diameter and aspect_ratio, not both")
			ok = false
		case aspect:
			de := dim("diameter", "the area-equivalent diameter", true)
			ar := d.nozzleNumber(s, "aspect_ratio", "the aspect ratio, long side over short side (at least 1)", true, &ok)
			if ok && ar < 1 {
				d.errorf(ErrInvalid, s.keyLine("aspect_ratio"), s.field("aspect_ratio"), "want the long side over the short side, at least 1, got %g", ar)
				ok = false
			} else if ok {
				ok = d.checkRange(s.keyLine("aspect_ratio"), s.field("aspect_ratio"), AspectRatioRange, ar, "")
			}
			mach := d.nozzleNumber(s, "design_mach", "the design Mach number", false, &ok)
			*nz = jet.RectangularFromAspect(de, ar, mach)
		default:
			nz.Width = dim("long_side", "the long side", true)
			nz.Height = dim("short_side", "the short side", true)
			nz.DesignMach = d.nozzleNumber(s, "design_mach", "the design Mach number", false, &ok)
		}
	case jet.Convergent, jet.ConvergentDivergent, jet.Coaxial:
		nz.Diameter = dim("diameter", "the exit diameter", true)
		if nz.Kind == jet.ConvergentDivergent {
			nz.DesignMach = d.nozzleNumber(s, "design_mach", "the design Mach number", true, &ok)
		}
		if nz.Kind == jet.Coaxial {
			nz.SecondaryDiameter = dim("secondary_diameter", "the outer diameter of the secondary annulus", true)
		}
	default: // unknown kind: read what is there, for its own errors
		for _, key := range []string{"diameter", "long_side", "short_side", "secondary_diameter"} {
			dim(key, "the "+key, false)
		}
		for _, key := range []string{"design_mach", "aspect_ratio"} {
			d.nozzleNumber(s, key, "a number", false, &ok)
		}
	}
	nz.Contour = contour
	if !ok {
		return
	}
	if err := nz.Validate(); err != nil {
		d.jetError(err, s, map[string]string{
			"nozzle diameter": "diameter", "nozzle width": "long_side", "nozzle height": "short_side",
			"design Mach number": "design_mach", "secondary diameter": "secondary_diameter", "nozzle kind": "kind",
			"nozzle contour": "contour",
		})
		return
	}
	ni.nozzleOK = true
}

// nozzleNumber reads the plain number held by key; a missing required key
// or a bad value clears *ok.
func (d *decoder) nozzleNumber(s *section, key, what string, required bool, ok *bool) float64 {
	n := s.get(key)
	if n == nil {
		if required {
			s.need(key, what+", a number")
			*ok = false
		}
		return 0
	}
	v, good := d.number(n, s.field(key), what+", a number")
	if good && key == "design_mach" && v > 1 { // at most 1 is the jet package's message
		good = d.checkRange(n.Line, s.field(key), DesignMachRange, v, "")
	}
	*ok = *ok && good
	return v
}

// jetError reports an error of the jet package at the key of s that fields
// maps its input to, or at s itself.
func (d *decoder) jetError(err error, s *section, fields map[string]string) {
	var ie *jet.InputError
	if errors.As(err, &ie) {
		if key, ok := fields[ie.Field]; ok && s.has(key) {
			d.add(ErrInvalid, err, s.keyLine(key), s.field(key), ie.Reason)
			return
		}
		d.add(ErrInvalid, err, s.line, s.path, ie.Field+" "+ie.Reason)
		return
	}
	d.add(ErrInvalid, err, s.line, s.path, err.Error())
}

// exitPlace checks the exit against the cell: inside the boundary, at
// least the nozzle's outer radius from it, its rim between floor and
// ceiling, and not inside an obstacle whose height range holds the axis.
func (d *decoder) exitPlace(s *section, ci *cellInfo, ni *nozzleInfo) {
	e := ni.frame.Exit
	at := orb.Point{e.X, e.Y}
	line, field := s.keyLine("exit"), s.field("exit")
	if ci.boundaryOK && ci.cell.Bounded() {
		dist := ci.cell.WallDistance(at)
		switch {
		case dist < 0:
			d.errorf(ErrInvalid, line, field, "the nozzle exit (%s, %s) is outside the cell %s", d.fmtLen(e.X), d.fmtLen(e.Y), outlineName(ci))
		case ni.nozzleOK && dist < ni.outerRadius():
			d.errorf(ErrInvalid, line, field, "the nozzle exit is %s from the cell %s, less than the nozzle's radius %s",
				d.fmtLen(dist), outlineName(ci), d.fmtLen(ni.outerRadius()))
		}
	}
	if ni.nozzleOK {
		r := ni.outerRadius()
		hl, hf := s.keyLine("axis_height"), s.field("axis_height")
		if d.heightRange(ci, e.Z-r, hl, hf, "the bottom of the nozzle rim") {
			d.heightRange(ci, e.Z+r, hl, hf, "the top of the nozzle rim")
		}
	}
	for _, o := range ci.cell.Obstacles {
		if o.Footprint.Contains(at) && o.ZMin <= e.Z && e.Z <= o.ZMax {
			d.errorf(ErrInvalid, line, field, "the nozzle exit is inside the obstacle %q (from %s to %s above the floor)", o.Name, d.fmtLen(o.ZMin), d.fmtLen(o.ZMax))
		}
	}
}

// outlineName names the cell's outline in messages.
func outlineName(ci *cellInfo) string {
	if ci.cell.Kind == geometry.OutdoorPad {
		return "site limit"
	}
	return "boundary"
}

func containsKind(kinds []jet.Kind, k jet.Kind) bool {
	for _, v := range kinds {
		if v == k {
			return true
		}
	}
	return false
}

// kindList names kinds as "convergent-divergent and rectangular".
func kindList(kinds []jet.Kind) string {
	if len(kinds) == 1 {
		return kinds[0].String()
	}
	return fmt.Sprintf("%s and %s", kinds[0], kinds[1])
}
