// Finds an asset by its id text without allocating: a flat open-addressing hash table built once
// from the accepted asset rows, then probed once per cost event (ten million times a night), so
// it keeps one small slot per asset and the id bytes back to back in one buffer.
//
//   AssetIndex index;
//   index.insert("PU-0001", 0);
//   index.find("PU-0001");   // 0
//   index.find("PU-9999");   // AssetIndex::npos
#pragma once

#include <cstdint>
#include <string>
#include <string_view>
#include <vector>

namespace tenure::fleet {

class AssetIndex {
 public:
  static constexpr std::uint32_t npos = UINT32_MAX;

  // Adds `id` -> `value`; returns false (and changes nothing) when `id` is already present.
  bool insert(std::string_view id, std::uint32_t value);
  // The value of `id`, or npos.
  std::uint32_t find(std::string_view id) const noexcept { return find(id, hash(id)); }
  // The same with the hash computed beforehand, for batches: hash every id of a batch and
  // prefetch its slot first, then find them all, so the memory reads overlap.
  static std::uint64_t hash(std::string_view id) noexcept;
  void prefetch(std::uint64_t hash) const noexcept {
    if (!slots_.empty()) __builtin_prefetch(&slots_[probe_start(hash)]);
  }
  std::uint32_t find(std::string_view id, std::uint64_t hash) const noexcept;
  bool contains(std::string_view id) const noexcept { return find(id) != npos; }
  std::size_t size() const noexcept { return count_; }

 private:
  struct Slot {
    std::uint32_t tag = 0;    // high bits of the hash; 0 marks an empty slot
    std::uint32_t value = 0;
    std::uint32_t key_offset = 0;
    std::uint32_t key_length = 0;
  };
  void grow();
  std::size_t probe_start(std::uint64_t h) const noexcept { return h & (slots_.size() - 1); }

  std::vector<Slot> slots_;
  std::string keys_;  // every id's bytes, back to back
  std::size_t count_ = 0;
};

}  // namespace tenure::fleet
