package layout

import (
	"math"

	"github.com/paulmach/orb"

	"arcwright/internal/geometry"
)

var (
	cellKeys      = []string{"kind", "boundary", "site_limit", "ceiling", "floor", "cutoff", "treatment_depth", "obstacles", "keep_out", "collector", "marks"}
	obstacleKeys  = []string{"name", "polygon", "circle", "from", "to"}
	keepOutKeys   = []string{"name", "polygon", "circle"}
	collectorKeys = []string{"inlet", "diameter", "heading"}
	markKeys      = []string{"name", "at"}

	// cellKinds are the layout's names of the geometry kinds.
	cellKinds = map[string]geometry.Kind{
		"anechoic":    geometry.Anechoic,
		"hard-walled": geometry.HardWalled,
		"outdoor":     geometry.OutdoorPad,
	}
	cellKindNames = []string{"anechoic", "hard-walled", "outdoor"}
	floorNames    = []string{"hard", "treated", "grass"}
)

// cellInfo is the decoded cell and what later checks may rely on.
type cellInfo struct {
	cell       geometry.Cell
	cutoff     float64 // Hz; 0 if none
	kindOK     bool    // cell.Kind is the layout's kind
	ceilingOK  bool    // cell.Ceiling is known (+Inf outdoors)
	boundaryOK bool    // cell.Boundary is usable (possibly empty outdoors)
	// collectorHeading is false when the collector's heading is to be the
	// nozzle's; collectorLine and collectorField locate it for messages.
	collectorHeading bool
	collectorLine    int
	collectorField   string
}

// cellSection decodes the cell: kind, outline, ceiling, floor, treatment,
// obstacles, keep-out zones, collector and marks.
func (d *decoder) cellSection(top *section) *cellInfo {
	s := top.needSub("cell", "the test cell (kind, boundary, ceiling, …)", cellKeys)
	ci := &cellInfo{}
	c := &ci.cell
	kind := ""
	if n := s.need("kind", "the cell kind: "+oneOf(cellKindNames)); n != nil {
		if k, ok := d.choice(n, s.field("kind"), cellKindNames); ok {
			kind, c.Kind, ci.kindOK = k, cellKinds[k], true
		}
	}
	outdoor := kind == "outdoor"

	// The outline: boundary indoors, site_limit (optional) outdoors.
	switch {
	case !ci.kindOK:
		for _, key := range []string{"boundary", "site_limit"} {
			if s.has(key) {
				d.ring(s.get(key), s.field(key), s.keyLine(key))
			}
		}
	case outdoor:
		if s.has("boundary") {
			d.errorf(ErrInvalid, s.keyLine("boundary"), s.field("boundary"), "an outdoor pad has no walls; give its site_limit instead (or neither, for an open pad)")
		}
		ci.boundaryOK = true
		if n := s.get("site_limit"); n != nil {
			c.Boundary, ci.boundaryOK = d.ring(n, s.field("site_limit"), s.keyLine("site_limit"))
		}
	default:
		if s.has("site_limit") {
			d.errorf(ErrInvalid, s.keyLine("site_limit"), s.field("site_limit"), "site_limit is for an outdoor pad; give the %s cell's boundary", kind)
		}
		if n := s.need("boundary", "the closed outline of the cell in plan (wedge tips or inner wall face)"); n != nil {
			c.Boundary, ci.boundaryOK = d.ring(n, s.field("boundary"), s.keyLine("boundary"))
		}
	}

	// The ceiling: required indoors, open sky outdoors.
	switch {
	case outdoor:
		c.Ceiling, ci.ceilingOK = math.Inf(1), true
		if s.has("ceiling") {
			d.errorf(ErrInvalid, s.keyLine("ceiling"), s.field("ceiling"), "an outdoor pad has no ceiling (open sky); remove the key")
			ci.ceilingOK = false
		}
	case ci.kindOK:
		if n := s.need("ceiling", "the ceiling height (wedge tips), a length such as 6 m"); n != nil {
			c.Ceiling, ci.ceilingOK = d.positiveLength(n, s.field("ceiling"), "the ceiling height")
		}
	default:
		if n := s.get("ceiling"); n != nil {
			d.positiveLength(n, s.field("ceiling"), "the ceiling height")
		}
	}

	c.Floor = geometry.Hard
	if c.Kind == geometry.Anechoic && ci.kindOK {
		c.Floor = geometry.Treated
	}
	if n := s.get("floor"); n != nil {
		if f, ok := d.choice(n, s.field("floor"), floorNames); ok {
			c.Floor, _ = geometry.ParseSurface(f) // f is one of floorNames
		}
	}
	if n := s.get("cutoff"); n != nil {
		if ci.kindOK && kind != "anechoic" {
			d.errorf(ErrInvalid, n.Line, s.field("cutoff"), "the cut-off frequency of the treatment applies only to an anechoic cell")
		} else if f, ok := d.frequency(n, s.field("cutoff")); ok {
			if f <= 0 {
				d.errorf(ErrInvalid, n.Line, s.field("cutoff"), "the cut-off frequency must be greater than 0 Hz")
			}
			ci.cutoff = f
		}
	}
	if n := s.get("treatment_depth"); n != nil {
		c.TreatmentDepth, _ = d.nonNegativeLength(n, s.field("treatment_depth"), "the treatment depth")
	}
	d.obstacles(s, ci)
	d.keepOuts(s, ci)
	d.collector(s, ci)
	d.marks(s, ci)
	return ci
}

// heightRange checks that z (m), read from field at line, is on or above
// the floor and, when the ceiling is known, not above it.
func (d *decoder) heightRange(ci *cellInfo, z float64, line int, field, what string) bool {
	switch {
	case z < 0:
		d.errorf(ErrInvalid, line, field, "%s is below the floor: %s", what, d.fmtLen(z))
		return false
	case ci.ceilingOK && z > ci.cell.Ceiling:
		d.errorf(ErrInvalid, line, field, "%s is above the ceiling: %s, ceiling at %s", what, d.fmtLen(z), d.fmtLen(ci.cell.Ceiling))
		return false
	}
	return true
}

// obstacles decodes cell.obstacles: each a footprint with a height range.
func (d *decoder) obstacles(s *section, ci *cellInfo) {
	items, _ := d.list(s.get("obstacles"), s.field("obstacles"), s.keyLine("obstacles"), "a list of obstacles")
	names := d.nameSet()
	for i, it := range items {
		o := d.section(it, index(s.field("obstacles"), i), it.Line, obstacleKeys)
		name, okName := d.name(o, "obstacle", names)
		fp, okShape := d.footprint(o)
		zMin, okFrom := 0.0, true
		if n := o.get("from"); n != nil {
			if zMin, okFrom = d.length(n, o.field("from")); okFrom {
				okFrom = d.heightRange(ci, zMin, n.Line, o.field("from"), "the bottom")
			}
		}
		var zMax float64
		okTo := false
		if n := o.need("to", "the height of the top above the floor, a length such as 1.5 m"); n != nil {
			if zMax, okTo = d.length(n, o.field("to")); okTo {
				okTo = d.heightRange(ci, zMax, n.Line, o.field("to"), "the top")
				if okTo && okFrom && zMax <= zMin {
					d.errorf(ErrInvalid, n.Line, o.field("to"), "the top (%s) must be above the bottom (%s)", d.fmtLen(zMax), d.fmtLen(zMin))
					okTo = false
				}
			}
		}
		if okShape && d.outsideCell(ci, fp, o, "obstacle") {
			okShape = false
		}
		if okName && okShape && okFrom && okTo {
			ci.cell.Obstacles = append(ci.cell.Obstacles, geometry.Obstacle{Name: name, Footprint: fp, ZMin: zMin, ZMax: zMax})
		}
	}
}

// keepOuts decodes cell.keep_out.
func (d *decoder) keepOuts(s *section, ci *cellInfo) {
	items, _ := d.list(s.get("keep_out"), s.field("keep_out"), s.keyLine("keep_out"), "a list of keep-out zones")
	names := d.nameSet()
	for i, it := range items {
		k := d.section(it, index(s.field("keep_out"), i), it.Line, keepOutKeys)
		name, okName := d.name(k, "keep-out zone", names)
		fp, okShape := d.footprint(k)
		if okShape && d.outsideCell(ci, fp, k, "keep-out zone") {
			okShape = false
		}
		if okName && okShape {
			ci.cell.KeepOuts = append(ci.cell.KeepOuts, geometry.KeepOut{Name: name, Footprint: fp})
		}
	}
}

// collector decodes cell.collector; its heading defaults to the nozzle's,
// filled in later.
func (d *decoder) collector(s *section, ci *cellInfo) {
	if !s.has("collector") {
		return
	}
	c := s.sub("collector", collectorKeys)
	ci.collectorLine, ci.collectorField = c.line, c.path
	col := &geometry.Collector{}
	ok := true
	if n := c.need("inlet", "the centre of the inlet, [x, y, z] with z above the floor"); n != nil {
		var okIn bool
		if col.Inlet, okIn = d.spacePoint(n, c.field("inlet"), c.keyLine("inlet")); okIn {
			okIn = d.heightRange(ci, col.Inlet.Z, c.keyLine("inlet"), c.field("inlet"), "the inlet centre")
		}
		ok = ok && okIn
	} else {
		ok = false
	}
	if n := c.need("diameter", "the inlet diameter, a length such as 1.2 m"); n != nil {
		var okD bool
		col.Diameter, okD = d.positiveLength(n, c.field("diameter"), "the inlet diameter")
		ok = ok && okD
	} else {
		ok = false
	}
	if ok {
		r := col.Diameter / 2
		ok = d.heightRange(ci, col.Inlet.Z-r, c.keyLine("diameter"), c.field("diameter"), "the bottom of the inlet") &&
			d.heightRange(ci, col.Inlet.Z+r, c.keyLine("diameter"), c.field("diameter"), "the top of the inlet")
	}
	if n := c.get("heading"); n != nil {
		var okH bool
		col.Heading, okH = d.angle(n, c.field("heading"))
		ci.collectorHeading = okH
		ok = ok && okH
	}
	if ok {
		ci.cell.Collector = col
	}
}

// marks decodes cell.marks.
func (d *decoder) marks(s *section, ci *cellInfo) {
	items, _ := d.list(s.get("marks"), s.field("marks"), s.keyLine("marks"), "a list of floor marks")
	names := d.nameSet()
	for i, it := range items {
		m := d.section(it, index(s.field("marks"), i), it.Line, markKeys)
		name, okName := d.name(m, "mark", names)
		var (
			at   orb.Point
			okAt bool
		)
		if n := m.need("at", "the position of the mark, [x, y]"); n != nil {
			at, okAt = d.planPoint(n, m.field("at"), m.keyLine("at"))
		}
		if okName && okAt {
			ci.cell.Marks = append(ci.cell.Marks, geometry.Mark{Name: name, At: at})
		}
	}
}

// outsideCell reports, and records as a problem, a footprint of s (an
// obstacle or a keep-out zone, what) that lies wholly outside a bounded
// cell: it can block nothing, so it is a slip of a coordinate or a unit.
func (d *decoder) outsideCell(ci *cellInfo, fp geometry.Footprint, s *section, what string) bool {
	c := &ci.cell
	if !ci.boundaryOK || !c.Bounded() {
		return false
	}
	p := fp.Center
	if !fp.IsCircle() {
		p = fp.Ring[0]
	}
	if c.Contains(p) {
		return false
	}
	if c.Extent().Intersects(fp.Bound()) {
		for i := 0; i+1 < len(c.Boundary); i++ {
			if fp.SegmentDistance(c.Boundary[i], c.Boundary[i+1]) == 0 {
				return false // it crosses or holds the outline
			}
		}
	}
	key := "polygon"
	if fp.IsCircle() {
		key = "circle"
	}
	d.errorf(ErrInvalid, s.keyLine(key), s.field(key), "this %s lies wholly outside the cell's %s; check its coordinates and their unit", what, outlineName(ci))
	return true
}
