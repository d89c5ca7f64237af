package export

import (
	"encoding/json"
	"fmt"
	"io"
	"math"

	"github.com/paulmach/orb"
	"github.com/paulmach/orb/geojson"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
	"arcwright/internal/planner"
)

// The foreign member "coordinate_frame" says what the coordinates are.
const (
	// localFrame: the layout has no anchor.
	localFrame = "LOCAL, NOT WGS 84: metres from the layout's datum, X and Y in plan (the cell frame); give the layout an anchor for longitude and latitude"
	// geographicFrame: the layout has an anchor.
	geographicFrame = "WGS 84 longitude and latitude (RFC 7946), from the cell frame by a local tangent plane at the layout's anchor"
)

// Layer names: the "layer" property of every feature.
const (
	layerBoundary   = "boundary"
	layerObstacle   = "obstacle"
	layerKeepOut    = "keep_out"
	layerCollector  = "collector"
	layerMark       = "mark"
	layerNozzle     = "nozzle"
	layerJetAxis    = "jet_axis"
	layerZone       = "zone"
	layerZoneMargin = "zone_margin"
	layerCore       = "core"
	layerArc        = "arc"
	layerStation    = "station"
	layerStandBase  = "stand_base"
	layerNoise      = "noise_contour"
	layerCrew       = "crew"
)

// GeoJSON writes p to w as a GeoJSON FeatureCollection, compact, followed
// by a newline.
//
// When the layout has an anchor (Request.Anchor), the coordinates are RFC
// 7946 WGS 84 longitudes and latitudes in degrees, rounded to 1e-9° (0.1 mm
// of latitude): each plan point is carried from the cell frame by the local
// tangent plane at the anchor ([geometry.Anchor.ToWGS84], exact to under
// 0.01 mm within 1 km of the datum), and the top-level members say
// "geographic": true and give the "anchor". Without an anchor the
// coordinates are the cell frame in metres (X and Y in plan from the datum),
// rounded to 0.1 mm: NOT longitude and latitude, which RFC 7946 would
// assume; the members say "geographic": false and the "coordinate_frame"
// says LOCAL, NOT WGS 84. Lengths in properties (_m) are metres either way.
// The members "source", "title" and "polar_angle_convention" follow.
// Features come in this order, each with a "layer" property:
//
//	boundary    Polygon: the cell boundary (bounded cells only)
//	obstacle    Polygon (a disc as a 64-gon with its vertices on the circle): name, z_min_m, z_max_m
//	keep_out    Polygon: name
//	collector   Point at the inlet centre: diameter_m, heading_deg, z_m
//	mark        Point: name
//	nozzle      Point at the exit centre: heading_deg, z_m
//	jet_axis    LineString from the exit to the end of the longest conservative zone of any point
//	zone        Polygon (MultiPolygon where the boundary cuts it apart): the zones the sheet
//	            draws, in the horizontal plane through the axis: the governing point's
//	            conservative velocity zone and the conservative hot zone of Plan.GoverningHot
//	            (the longest); zone ("velocity" or "hot"), point, variant, limit, limit_unit,
//	            length_m, max_radius_m, margin_m, cut
//	zone_margin the same zones grown by the layout's margin (the sheet's dotted band), same
//	            properties
//	core        Polygon: the governing point's nominal potential core, as the sheet draws it
//
// In a bounded cell the zones, margins and core are cut at the boundary as
// the sheet cuts them ("cut" true when the boundary cut the shape; a zone
// wholly outside is left out).
//
//	arc         LineString through the stations of each arc array, following the arc
//	station     Point at the microphone: id, channel (null for a probe stand), array, status, z_m, polar_deg
//	stand_base  Point at the stand pole, where it differs from the microphone's plan position
//	crew        Point at a crew position: name, z_m, hours, and its loudest a_weighted_db,
//	            peak_db, point and status
//	noise_contour MultiLineString: the predicted 85 dB(A), layout's dB(A) and 140 dB(C) peak
//	            contours at ear height for the loudest point (see planner.Plan.NoiseMap):
//	            level_db, weighting ("A" or "C peak"), point, height_m, everywhere (true
//	            when the whole mapped area is above the level; then without lines)
//
// Property values that are NaN or ±Inf are null. The output is
// deterministic.
//
// It returns an error wrapping [ErrNoPlan] when p or p.Request is nil,
// wrapping [ErrInvalidPlan] when p cannot be written, wrapping
// [ErrNotFinite] and naming the feature when a coordinate is NaN or ±Inf,
// and the error of w.
func GeoJSON(w io.Writer, p *planner.Plan) error {
	if err := checkPlan(p); err != nil {
		return err
	}
	fc, err := newCollection(p)
	if err != nil {
		return err
	}
	b, err := json.Marshal(fc)
	if err != nil {
		return fmt.Errorf("export: writing GeoJSON: %w", err)
	}
	if _, err := w.Write(append(b, '\n')); err != nil {
		return fmt.Errorf("export: writing GeoJSON: %w", err)
	}
	return nil
}

// collection gathers features and keeps the first error.
type collection struct {
	fc     *geojson.FeatureCollection
	err    error
	anchor *geometry.Anchor // nil: coordinates in the cell frame
}

// add appends a feature of the given layer; what names it in an error.
// The geometry must already be rounded and checked (see point, path and
// polygon); ok false records an ErrNotFinite error instead.
func (c *collection) add(layer, what string, g orb.Geometry, ok bool, props geojson.Properties) {
	if c.err != nil {
		return
	}
	if !ok {
		if what != "" {
			layer += " " + what
		}
		c.err = fmt.Errorf("%w: %s has a coordinate that is NaN or infinite", ErrNotFinite, layer)
		return
	}
	f := geojson.NewFeature(g)
	props["layer"] = layer
	f.Properties = props
	c.fc.Append(f)
}

// newCollection builds the feature collection of a plan that passed
// checkPlan.
func newCollection(p *planner.Plan) (*geojson.FeatureCollection, error) {
	r := p.Request
	conv, _ := conventionName(r.Convention)
	c := &collection{fc: geojson.NewFeatureCollection(), anchor: r.Anchor}
	c.fc.ExtraMembers = geojson.Properties{
		"coordinate_frame":       localFrame,
		"geographic":             false,
		"source":                 r.Source,
		"title":                  r.Title.Title,
		"polar_angle_convention": conv,
	}
	if a := r.Anchor; a != nil {
		c.fc.ExtraMembers["coordinate_frame"] = geographicFrame
		c.fc.ExtraMembers["geographic"] = true
		c.fc.ExtraMembers["anchor"] = geojson.Properties{
			"latitude_deg": sig(a.Latitude * 180 / math.Pi), "longitude_deg": sig(a.Longitude * 180 / math.Pi),
			"bearing_of_x_deg": sig(a.BearingX * 180 / math.Pi),
		}
	}
	c.addCell(&r.Cell)
	c.addJet(p)
	c.addArcs(p)
	c.addStations(p)
	c.addCrew(p)
	if len(p.Points) > 0 {
		m, err := p.NoiseMap()
		if err != nil {
			return nil, fmt.Errorf("export: noise contours: %w", err)
		}
		c.addNoise(m)
	}
	return c.fc, c.err
}

// addCell adds the boundary, obstacles, keep-out zones, collector and marks.
func (c *collection) addCell(cell *geometry.Cell) {
	if cell.Bounded() {
		g, ok := c.polygon(cell.Boundary)
		c.add(layerBoundary, "", g, ok, geojson.Properties{
			"cell_kind":         cell.Kind.String(),
			"floor":             cell.Floor.String(),
			"ceiling_m":         metres(cell.Ceiling),
			"treatment_depth_m": metres(cell.TreatmentDepth),
		})
	}
	for _, o := range cell.Obstacles {
		g, ok := c.footprint(o.Footprint)
		props := geojson.Properties{"name": o.Name, "z_min_m": metres(o.ZMin), "z_max_m": metres(o.ZMax)}
		if o.Footprint.IsCircle() {
			props["radius_m"] = metres(o.Footprint.Radius)
		}
		c.add(layerObstacle, fmt.Sprintf("%q", o.Name), g, ok, props)
	}
	for _, k := range cell.KeepOuts {
		g, ok := c.footprint(k.Footprint)
		c.add(layerKeepOut, fmt.Sprintf("%q", k.Name), g, ok, geojson.Properties{"name": k.Name})
	}
	if col := cell.Collector; col != nil {
		g, ok := c.point(col.Inlet.X, col.Inlet.Y)
		c.add(layerCollector, "", g, ok, geojson.Properties{
			"diameter_m": metres(col.Diameter), "heading_deg": degrees(col.Heading), "z_m": metres(col.Inlet.Z),
		})
	}
	for _, m := range cell.Marks {
		g, ok := c.point(m.At[0], m.At[1])
		c.add(layerMark, fmt.Sprintf("%q", m.Name), g, ok, geojson.Properties{"name": m.Name})
	}
}

// addStations adds a point per station and one per stand base that is not
// under its microphone.
func (c *collection) addStations(p *planner.Plan) {
	for i := range p.Stations {
		s := &p.Stations[i]
		status, _ := verdictName(s.Status)
		var stand any // null for a flush microphone
		if s.Stand != nil {
			stand = s.Stand.Name
		}
		var ch any // null for a probe stand, which has no channel
		if s.Kind != planner.Probes {
			ch = s.Channel
		}
		g, ok := c.point(s.Mic.X, s.Mic.Y)
		c.add(layerStation, fmt.Sprintf("%q", s.ID), g, ok, geojson.Properties{
			"id": s.ID, "channel": ch, "array": s.Array, "kind": kindName(s.Kind),
			"status": status, "z_m": metres(s.Mic.Z), "height_m": metres(s.Height),
			"polar_deg": degrees(s.Polar), "stand": stand,
		})
	}
	for i := range p.Stations {
		s := &p.Stations[i]
		mic, okMic := c.point(s.Mic.X, s.Mic.Y)
		base, ok := c.point(s.Base[0], s.Base[1])
		if okMic && ok && base == mic {
			continue
		}
		c.add(layerStandBase, fmt.Sprintf("%q", s.ID), base, ok, geojson.Properties{
			"id": s.ID, "array": s.Array, "stand": standName(s),
		})
	}
}

// vec2 returns the plan position of v.
func vec2(v r3.Vec) orb.Point { return orb.Point{v.X, v.Y} }
