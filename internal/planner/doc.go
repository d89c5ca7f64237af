// Package planner turns a request (cell, nozzle, test matrix, limits and
// array patterns) into a plan: every microphone station placed, every check
// evaluated for every operating point, and a verdict with reasons for each
// station.
//
// # Stations
//
// Arcs, sidelines, near-field lines that follow the plume edge, azimuthal
// rings, single points and probe stands become [Station] values with an ID,
// a channel, cell coordinates (from the datum) and jet coordinates. A stand
// with a boom has its pole on the side of the microphone away from the jet,
// so the boom points the microphone toward the source.
//
// # Checks
//
// Each station is checked against every operating point; the worst result
// of each check is kept with the name of the point that gave it. A station
// is OK only if every check is OK for every point. The checks and their
// thresholds are listed with the Check* constants; clearances from the jet
// use the conservative envelopes of package jet plus the request's margin,
// and are taken for the microphone, its boom and its stand from the floor up.
//
// # Crowded stands
//
// The spacing check names the stand that overlaps a station's stand most
// (or the nearest one) with the gap, and counts the stands that overlap it,
// or come closer than the layout asks, up to 100: beyond that the reason
// says "overlaps more than 100 other stands". The verdict rests on the
// deepest overlap alone, which is found exactly: a k-d tree of the stands'
// centres whose nodes know their largest base, so that a wide base farther
// off is not missed for a small one nearer. A sight-line reason names at
// most three blockers. So a crowd of thousands of stands that all overlap
// one another costs each station about what a crowd of a hundred does, and
// its reasons stay one line each.
//
// # Automatic radius
//
// An arc with AutoRadius gets the largest radius at which every requested
// angle keeps its stand, base and microphone inside the room with the
// required wall clearance (the larger of the user's wall clearance and, in
// an anechoic room, a quarter wavelength at the band's low end) and below
// the ceiling. The plan also reports the interval of radii that meets the
// far-field criteria, and what limits it.
package planner
