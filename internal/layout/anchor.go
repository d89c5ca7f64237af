package layout

import (
	"math"

	"arcwright/internal/geometry"
)

// anchorKeys are the keys of the optional geographic anchor.
var anchorKeys = []string{"latitude", "longitude", "bearing_of_x"}

// anchorSection decodes the optional anchor: the WGS 84 latitude and
// longitude of the cell's datum and the true bearing of its +X axis
// (angles; a bare number is in degrees). All three are needed when the
// section is given; nil when it is not.
func (d *decoder) anchorSection(top *section) *geometry.Anchor {
	if !top.has("anchor") {
		return nil
	}
	s := top.sub("anchor", anchorKeys)
	var a geometry.Anchor
	good := true
	for _, f := range []struct {
		key, want string
		dst       *float64
		limit     float64
	}{
		{"latitude", "the WGS 84 latitude of the datum, north positive, such as 52.0712 deg", &a.Latitude, geometry.MaxAnchorLatitude},
		{"longitude", "the WGS 84 longitude of the datum, east positive, such as -1.0213 deg", &a.Longitude, math.Pi},
		{"bearing_of_x", "the true bearing of the cell's +X axis, clockwise from north, such as 90 deg when +X points east", &a.BearingX, math.Inf(1)},
	} {
		n := s.need(f.key, f.want)
		if n == nil {
			good = false
			continue
		}
		v, ok := d.angle(n, s.field(f.key))
		if ok && math.Abs(v) > f.limit {
			d.errorf(ErrInvalid, n.Line, s.field(f.key), "%.6g° is out of range: want %s, at most %.0f° either way", v*180/math.Pi, f.want, f.limit*180/math.Pi)
			ok = false
		}
		*f.dst, good = v, good && ok
	}
	if !good {
		return nil
	}
	if err := a.Validate(); err != nil {
		d.add(ErrInvalid, err, s.line, s.path, err.Error())
		return nil
	}
	return &a
}
