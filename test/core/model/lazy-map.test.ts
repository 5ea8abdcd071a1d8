// LazyMap: behaves as the Map it stands for, and loads once, on first use.
import { describe, expect, it } from 'vitest'
import { LazyMap } from '../../../src/core/model/lazy-map.ts'

describe('LazyMap', () => {
  const entries: [string, number][] = [
    ['s2:el\u00003', 0.152],
    ['b\u00007', -0.0877],
  ]

  it('does not load until it is read', () => {
    let loads = 0
    const m = new LazyMap(() => {
      loads++
      return entries
    })
    expect(loads).toBe(0)
    expect(m.get('b\u00007')).toBe(-0.0877)
    expect(m.get('nothing')).toBeUndefined()
    expect(m.size).toBe(2)
    expect(loads).toBe(1)
  })

  it.each([
    ['entries', (m: Map<string, number>) => [...m]],
    ['keys', (m: Map<string, number>) => [...m.keys()]],
    ['values', (m: Map<string, number>) => [...m.values()]],
    ['has', (m: Map<string, number>) => m.has('s2:el\u00003')],
    ['set', (m: Map<string, number>) => [...m.set('x', 1)]],
  ])('answers %s as a Map with the same entries does', (_name, read) => {
    expect(read(new LazyMap(() => entries))).toEqual(read(new Map(entries)))
  })
})
