import { defineStore } from 'pinia'
import { ref } from 'vue'
import type { CreateProjectBody, Project, UpdateProjectBody } from '../../shared/schema/api/projects'
import { api } from '../api/client'

/** The organisation's projects as listed on the projects page. */
export const useProjectsStore = defineStore('projects', () => {
  const items = ref<Project[]>([])
  const loading = ref(false)
  const error = ref<string | null>(null)

  async function load() {
    loading.value = true
    error.value = null
    try {
      items.value = await api.projects.list()
    } catch (e) {
      error.value = (e as Error).message
    } finally {
      loading.value = false
    }
  }

  function replace(p: Project) {
    const i = items.value.findIndex((x) => x.id === p.id)
    if (i >= 0) items.value.splice(i, 1, p)
    else items.value.unshift(p)
  }

  async function create(body: CreateProjectBody): Promise<Project> {
    const p = await api.projects.create(body)
    replace(p)
    return p
  }

  /** Saves with the version the caller saw; a 409 surfaces as ApiError with code 'conflict'. */
  async function update(id: string, body: UpdateProjectBody): Promise<Project> {
    const p = await api.projects.update(id, body)
    replace(p)
    return p
  }

  async function remove(id: string) {
    await api.projects.remove(id)
    items.value = items.value.filter((p) => p.id !== id)
  }

  return { items, loading, error, load, create, update, remove, replace }
})
