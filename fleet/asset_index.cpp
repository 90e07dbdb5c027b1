// Flat open-addressing asset index (see asset_index.h): linear probing, table kept at most half
// full, FNV-1a hashing (ids are short), a 32-bit tag per slot so that most probes compare no
// bytes.
#include "fleet/asset_index.h"

#include <limits>

#include "core/errors.h"

namespace tenure::fleet {

std::uint64_t AssetIndex::hash(std::string_view id) noexcept {
  std::uint64_t h = 14695981039346656037ull;
  for (char c : id) {
    h ^= static_cast<unsigned char>(c);
    h *= 1099511628211ull;
  }
  // Fold the high bits down so the low bits used for the slot depend on every byte.
  return h ^ (h >> 29);
}

static std::uint32_t tag_of(std::uint64_t h) noexcept {
  const auto tag = static_cast<std::uint32_t>(h >> 32);
  return tag == 0 ? 1 : tag;
}

std::uint32_t AssetIndex::find(std::string_view id, std::uint64_t h) const noexcept {
  if (slots_.empty()) return npos;
  const std::uint32_t tag = tag_of(h);
  for (std::size_t i = probe_start(h);; i = (i + 1) & (slots_.size() - 1)) {
    const Slot& s = slots_[i];
    if (s.tag == 0) return npos;
    if (s.tag == tag && s.key_length == id.size() &&
        std::string_view(keys_.data() + s.key_offset, s.key_length) == id) {
      return s.value;
    }
  }
}

void AssetIndex::grow() {
  std::vector<Slot> old = std::move(slots_);
  slots_.assign(old.empty() ? 1024 : old.size() * 2, Slot{});
  for (const Slot& s : old) {
    if (s.tag == 0) continue;
    const std::uint64_t h = hash(std::string_view(keys_.data() + s.key_offset, s.key_length));
    std::size_t i = probe_start(h);
    while (slots_[i].tag != 0) i = (i + 1) & (slots_.size() - 1);
    slots_[i] = s;
  }
}

bool AssetIndex::insert(std::string_view id, std::uint32_t value) {
  if (find(id) != npos) return false;
  if ((count_ + 1) * 2 > slots_.size()) grow();
  if (keys_.size() + id.size() > std::numeric_limits<std::uint32_t>::max()) {
    throw InputError("asset_id", "the asset ids together exceed 4 GiB");
  }
  const std::uint64_t h = hash(id);
  std::size_t i = probe_start(h);
  while (slots_[i].tag != 0) i = (i + 1) & (slots_.size() - 1);
  slots_[i] = {tag_of(h), value, static_cast<std::uint32_t>(keys_.size()),
               static_cast<std::uint32_t>(id.size())};
  keys_.append(id);
  ++count_;
  return true;
}

}  // namespace tenure::fleet
