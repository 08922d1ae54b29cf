import { createApp } from 'vue'
import { createPinia } from 'pinia'
import PrimeVue from 'primevue/config'
import ConfirmationService from 'primevue/confirmationservice'
import ToastService from 'primevue/toastservice'
import 'primeicons/primeicons.css'
import './styles/fonts.css'
import './styles/base.css'
import App from './App.vue'
import { router } from './router/index'
import { TouchproofPreset } from './theme/preset'

const app = createApp(App)
app.use(createPinia())
app.use(router)
app.use(PrimeVue, {
  theme: {
    preset: TouchproofPreset,
    // Light scheme only for now; a dark scheme would need its own contrast review.
    options: { darkModeSelector: '.tp-dark', cssLayer: false },
  },
})
app.use(ToastService)
app.use(ConfirmationService)
app.mount('#app')
