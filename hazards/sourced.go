package hazards

import "ullage/fluids"

// Sourced is a number with the publication it came from; see
// fluids.Sourced.
type Sourced = fluids.Sourced
