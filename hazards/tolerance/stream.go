package tolerance

import "math/rand/v2"

// ChunkUnits is the number of units drawn from one random stream. Units
// are handed to the workers a chunk at a time, and chunk c always holds
// units c·ChunkUnits to (c+1)·ChunkUnits − 1 drawn from stream c, which is
// why the number of workers never changes the result.
const ChunkUnits = 4096

// seedChunk reseeds pcg for chunk c of the study with the given seed. The
// two 64-bit PCG seeds are scrambled with the SplitMix64 finaliser (G. L.
// Steele, D. Lea and C. H. Flood, "Fast splittable pseudorandom number
// generators", OOPSLA 2014) so that neighbouring chunks and neighbouring
// seeds start far apart in the generator's state space.
func seedChunk(pcg *rand.PCG, seed uint64, c int) {
	hi := splitMix64(seed ^ splitMix64(uint64(c)+0x632be59bd9b4e019))
	lo := splitMix64(hi ^ 0xd1b54a32d192ed03)
	pcg.Seed(hi, lo)
}

// splitMix64 is the SplitMix64 output function (Steele, Lea and Flood
// 2014): an add of the golden-ratio increment and two xor-shift-multiply
// rounds.
func splitMix64(x uint64) uint64 {
	x += 0x9e3779b97f4a7c15
	x = (x ^ (x >> 30)) * 0xbf58476d1ce4e5b9
	x = (x ^ (x >> 27)) * 0x94d049bb133111eb
	return x ^ (x >> 31)
}
